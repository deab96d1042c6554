import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { canManageClub, canReachClub } from '@endgrain/shared';

import type { AuthUser } from '../../common/auth/auth-user.js';
import { DomainError } from '../../common/errors/domain-error.js';
import type { EntryEntity } from '../../meets/entities/entry.entity.js';
import type { AssignLineupInput } from '../dto/lineup.input.js';
import type { AxeEntity } from '../entities/axe.entity.js';
import type { AssignLineupPayload, LineupModel, LineupOverrideModel } from '../models/lineup.model.js';
import { headSnapshot, type HeadSnapshot } from '../head-snapshot.js';
import { RackRepository } from '../rack.repository.js';
import { athleteName, toAssignmentModel, toLineupEntries, toOverrideModel } from './lineup.mappers.js';
import { checkLineup } from './lineup-rules.js';

const CLOSED_MEETS = ['PUBLISHED', 'ARCHIVED'];

@Injectable()
export class LineupsService {
  constructor(@Inject(RackRepository) private readonly repo: RackRepository) {}

  async lineup(actor: AuthUser, meetId: string, clubId: string): Promise<LineupModel> {
    if (!canReachClub(actor, clubId)) throw DomainError.forbidden("Only this club's members can see its lineup.");
    const [meet, club] = await Promise.all([this.repo.findMeet(meetId), this.repo.findClub(clubId)]);
    if (!meet) throw DomainError.notFound('That meet');
    if (!club) throw DomainError.notFound('That club');
    const entries = await this.repo.clubEntries(meetId, clubId);
    const assignments = await this.repo.assignmentsFor(entries.map((e) => e.id));
    const overrides = await this.repo.findOverrides(assignments.flatMap((a) => (a.overrideId ? [a.overrideId] : [])));
    return {
      meetId,
      meetName: meet.name,
      meetDate: meet.startsOn,
      venue: meet.venue,
      clubId,
      clubName: club.name,
      canManage: canManageClub(actor, clubId),
      entries: toLineupEntries(entries, new Map(assignments.map((a) => [a.entryId, a])), new Map(overrides.map((o) => [o.id, o]))),
    };
  }

  async assign(actor: AuthUser, input: AssignLineupInput): Promise<AssignLineupPayload> {
    const entry = await this.manageableEntry(actor, input.entryId);
    const athlete = this.pickAthlete(entry, input.athleteId ?? null);
    const axe = input.axeId ? await this.pickAxe(entry, input.axeId) : null;
    const sameHeat = axe && entry.heat !== null ? await this.repo.sameHeatAssignments(axe.id, entry.meetEventId, entry.heat, entry.id) : [];
    const name = athleteName(athlete);
    const verdict = checkLineup({
      athlete: { name, experience: athlete.experience },
      axe,
      overrideReason: input.overrideReason ?? null,
      sameHeatAthletes: sameHeat.map((a) => athleteName(a.athlete)).filter((n) => n !== name),
    });
    if (!verdict.ok) throw DomainError.badInput(verdict.field, verdict.message);
    const byName = await this.repo.displayName(actor.id);
    await this.repo.db.transaction(async (m) => {
      let overrideId: string | null = null;
      if (verdict.overrideUsed && axe) {
        overrideId = randomUUID();
        await this.repo.overrides(m).insert({
          id: overrideId,
          clubId: entry.clubId,
          meetId: entry.meetEvent.meetId,
          entryId: entry.id,
          athleteId: athlete.id,
          athleteName: name,
          athleteExperience: athlete.experience,
          axeId: axe.id,
          axeLabel: axe.label,
          axeAllowedFor: axe.allowedFor,
          reason: (input.overrideReason ?? '').trim(),
          byUserId: actor.id,
          byName,
        });
      }
      await this.repo.assignments(m).upsert({ entryId: entry.id, athleteId: athlete.id, axeId: axe?.id ?? null, overrideId, assignedBy: actor.id }, ['entryId']);
    });
    const [saved] = await this.repo.assignmentsFor([entry.id]);
    const [override] = await this.repo.findOverrides(saved?.overrideId ? [saved.overrideId] : []);
    return { assignment: toAssignmentModel(saved!, override), warnings: verdict.warnings };
  }

  /** For posting results: the head assigned to an entry, as a snapshot to keep with the result. */
  async headUsedFor(entryId: string, now = new Date()): Promise<HeadSnapshot | null> {
    const [assignment] = await this.repo.assignmentsFor([entryId]);
    return assignment?.axe ? headSnapshot(assignment.axe, now) : null;
  }

  async clear(actor: AuthUser, entryId: string): Promise<boolean> {
    await this.manageableEntry(actor, entryId);
    await this.repo.assignments().delete({ entryId });
    return true;
  }

  async overrides(actor: AuthUser, meetId: string, clubId: string): Promise<LineupOverrideModel[]> {
    if (!canManageClub(actor, clubId)) throw DomainError.forbidden("Only this club's coaches can read its override record.");
    return (await this.repo.overridesOf(meetId, clubId)).map(toOverrideModel);
  }

  private async manageableEntry(actor: AuthUser, entryId: string): Promise<EntryEntity> {
    const entry = await this.repo.findEntry(entryId);
    if (!entry) throw DomainError.notFound('That entry');
    if (!canManageClub(actor, entry.clubId)) throw DomainError.forbidden("Only this club's coaches can set its lineup.");
    if (CLOSED_MEETS.includes(entry.meetEvent.meet.status)) {
      throw DomainError.badInput('entryId', 'This meet is published; its lineup is part of the record and can no longer change.');
    }
    return entry;
  }

  private pickAthlete(entry: EntryEntity, athleteId: string | null) {
    const entered = (entry.athletes ?? []).map((ea) => ea.athlete);
    const athlete = athleteId ? entered.find((a) => a.id === athleteId) : entered.length === 1 ? entered[0] : undefined;
    if (!athlete) {
      const names = entered.map(athleteName).join(', ') || 'nobody yet';
      throw DomainError.badInput('athleteId', `Pick one of the athletes in this entry (${names}).`);
    }
    return athlete;
  }

  private async pickAxe(entry: EntryEntity, axeId: string): Promise<AxeEntity> {
    const axe = await this.repo.findAxe(axeId);
    if (!axe || axe.clubId !== entry.clubId) throw DomainError.badInput('axeId', "Pick an axe from your own club's rack.");
    if (!entry.meetEvent.eventType.usesHead) {
      throw DomainError.badInput('axeId', `${entry.meetEvent.eventType.name} is not chopped with an axe head; leave the axe empty.`);
    }
    return axe;
  }
}
