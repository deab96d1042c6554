import { Inject, Injectable } from '@nestjs/common';
import { canManageClub } from '@endgrain/shared';
import type { EntityManager } from 'typeorm';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { ErrorCode } from '../common/errors/error-code.js';
import type { AxeEntity } from '../rack/entities/axe.entity.js';
import type { SaveTrialInput } from './dto/save-trial.input.js';
import type { TrialRunEntity } from './entities/trial-run.entity.js';
import type { TrialEntity } from './entities/trial.entity.js';
import type { TrialModel } from './models/trial.model.js';
import { outOfUseReason } from './trial-axe-use.js';
import { trialValues, uuid, type RunValues, type TrialValues } from './trial-values.js';
import { TrialsRepository } from './trials.repository.js';
import { TrialsService } from './trials.service.js';

/** Saving a whole trial from the recording device: create or replace, idempotent on resend. */
@Injectable()
export class TrialRecordingService {
  constructor(
    @Inject(TrialsRepository) private readonly repo: TrialsRepository,
    @Inject(TrialsService) private readonly trialsService: TrialsService,
  ) {}

  async save(actor: AuthUser, input: SaveTrialInput, now = new Date()): Promise<TrialModel> {
    const id = uuid('id', input.id);
    const clubId = uuid('clubId', input.clubId);
    if (!canManageClub(actor, clubId)) throw DomainError.forbidden("Only this club's coaches record and edit its trials.");
    if (!(await this.repo.findClub(clubId))) throw DomainError.notFound('That club');
    const existing = await this.repo.findTrial(id);
    if (existing && !canManageClub(actor, existing.clubId)) throw DomainError.notFound('That trial');
    if (existing && existing.saveToken === input.saveToken) return this.trialsService.detail(actor, id);
    this.assertFresh(existing, input, clubId);
    const values = trialValues(input, now);
    const axes = new Map((await this.repo.clubAxes(clubId)).map((a) => [a.id, a]));
    this.assertAxes(values, axes, existing);
    const athleteNames = await this.athleteNames(clubId, values);
    await this.repo.db.transaction(async (m) => {
      await this.writeTrial(m, { id, clubId, values, existing, token: input.saveToken, actor });
      await this.writeTesters(m, id, values, athleteNames);
      await this.writeRuns(m, id, values.runs, axes, existing?.runs ?? []);
    });
    return this.trialsService.detail(actor, id);
  }

  private assertFresh(existing: TrialEntity | null, input: SaveTrialInput, clubId: string): void {
    if (!existing) {
      if (input.baseVersion != null) throw new DomainError(ErrorCode.Conflict, 'This trial was deleted on another device; start a new one.');
      return;
    }
    if (existing.clubId !== clubId) throw DomainError.badInput('clubId', 'A trial stays with the club that recorded it.');
    // The phone lost the answer to its last send, but that send did land: this edit follows it.
    const landed = Boolean(input.unansweredToken) && existing.saveToken === input.unansweredToken;
    if (!landed && input.baseVersion !== existing.version) {
      throw new DomainError(ErrorCode.Conflict, 'This trial was changed on another device since you opened it; reload it before saving again.');
    }
  }

  /** Axes come from the club's rack; an axe out of use cannot be newly put on the block. */
  private assertAxes(values: TrialValues, axes: ReadonlyMap<string, AxeEntity>, existing: TrialEntity | null): void {
    if (!axes.has(values.referenceAxeId)) throw DomainError.badInput('referenceAxeId', "Pick the reference axe from the club's rack.");
    const before = new Map((existing?.runs ?? []).map((r) => [r.id, r.axeId]));
    values.runs.forEach((run, i) => {
      const axe = axes.get(run.axeId);
      if (!axe) throw DomainError.badInput(`runs.${i}.axeId`, "Pick each axe from the club's rack.");
      const reason = outOfUseReason(axe.status);
      if (reason && before.get(run.id) !== run.axeId) {
        throw DomainError.badInput(`runs.${i}.axeId`, `${axe.label} is out of use because ${reason}; fix it before it is swung again.`);
      }
    });
  }

  private async athleteNames(clubId: string, values: TrialValues): Promise<Map<string, string>> {
    const wanted = values.testers.filter((t) => t.athleteId !== null);
    if (wanted.length === 0) return new Map();
    const roster = new Map((await this.repo.clubAthletes(clubId)).map((a) => [a.id, `${a.firstName} ${a.lastName}`]));
    for (const t of wanted) {
      if (!roster.has(t.athleteId!)) throw DomainError.badInput(`testers.${t.position}.athleteId`, "Pick the tester from the club's roster.");
    }
    return roster;
  }

  private async writeTrial(
    m: EntityManager,
    w: { id: string; clubId: string; values: TrialValues; existing: TrialEntity | null; token: string; actor: AuthUser },
  ): Promise<void> {
    const { testers: _testers, runs: _runs, ...columns } = w.values;
    const row = { ...columns, saveToken: w.token.slice(0, 64) };
    if (w.existing) {
      await this.repo.trials(m).update({ id: w.id }, { ...row, version: w.existing.version + 1 });
    } else {
      await this.repo.trials(m).insert({ id: w.id, clubId: w.clubId, ...row, version: 1, recordedBy: w.actor.id });
    }
  }

  private async writeTesters(m: EntityManager, trialId: string, values: TrialValues, athleteNames: ReadonlyMap<string, string>): Promise<void> {
    // Runs point at testers: clear the runs first, then the testers, then write both afresh.
    await this.repo.runs(m).delete({ trialId });
    await this.repo.testers(m).delete({ trialId });
    if (values.testers.length === 0) return;
    await this.repo.testers(m).insert(
      values.testers.map((t) => ({
        id: t.id,
        trialId,
        athleteId: t.athleteId,
        name: t.name || athleteNames.get(t.athleteId ?? '') || 'Tester',
        position: t.position,
      })),
    );
  }

  /** A run that keeps its axe keeps the head it was recorded with; a new one snapshots the rack's setup now. */
  private async writeRuns(m: EntityManager, trialId: string, runs: RunValues[], axes: ReadonlyMap<string, AxeEntity>, before: TrialRunEntity[]): Promise<void> {
    if (runs.length === 0) return;
    const old = new Map(before.map((r) => [r.id, r]));
    await this.repo.runs(m).insert(
      runs.map((run) => {
        const kept = old.get(run.id);
        const head = kept && kept.axeId === run.axeId ? kept : axes.get(run.axeId)!;
        return {
          ...run,
          trialId,
          grind: head.grind,
          bevelIncludedDeg: head.bevelIncludedDeg,
          chiselWidthMm: head.chiselWidthMm,
        };
      }),
    );
  }
}
