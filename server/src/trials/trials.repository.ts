import { Inject, Injectable } from '@nestjs/common';
import { DataSource, In, type EntityManager } from 'typeorm';

import { AthleteEntity } from '../league/entities/athlete.entity.js';
import { ClubEntity } from '../league/entities/club.entity.js';
import { AxeEntity } from '../rack/entities/axe.entity.js';
import { TrialRunEntity } from './entities/trial-run.entity.js';
import { TrialSummaryEntity } from './entities/trial-summary.entity.js';
import { TrialTesterEntity } from './entities/trial-tester.entity.js';
import { TrialEntity } from './entities/trial.entity.js';

const FULL = { club: true, referenceAxe: true, testers: true, runs: { axe: true } } as const;

/** The only place that queries the trial tables (and the clubs, axes and athletes they point at). */
@Injectable()
export class TrialsRepository {
  constructor(@Inject(DataSource) readonly db: DataSource) {}

  trials(m?: EntityManager) {
    return (m ?? this.db.manager).getRepository(TrialEntity);
  }
  testers(m?: EntityManager) {
    return (m ?? this.db.manager).getRepository(TrialTesterEntity);
  }
  runs(m?: EntityManager) {
    return (m ?? this.db.manager).getRepository(TrialRunEntity);
  }
  summaries(m?: EntityManager) {
    return (m ?? this.db.manager).getRepository(TrialSummaryEntity);
  }

  findClub(id: string): Promise<ClubEntity | null> {
    return this.db.getRepository(ClubEntity).findOneBy({ id });
  }

  /** A trial with its club, reference axe, testers and runs (each with its axe). */
  findTrial(id: string, m?: EntityManager): Promise<TrialEntity | null> {
    return this.trials(m).findOne({ where: { id }, relations: FULL });
  }

  /** A club's trials, newest first, fully loaded (the list shows each verdict's leader). */
  clubTrials(clubId: string): Promise<TrialEntity[]> {
    return this.trials().find({ where: { clubId }, relations: FULL, order: { testedOn: 'DESC', createdAt: 'DESC' } });
  }

  /** Every trial an axe was swung in (or was the reference of), newest first. */
  async trialsOfAxe(axeId: string): Promise<TrialEntity[]> {
    const rows = await this.db.query<{ id: string }[]>(
      'SELECT id FROM trials WHERE reference_axe_id = ? UNION SELECT trial_id AS id FROM trial_runs WHERE axe_id = ?',
      [axeId, axeId],
    );
    if (rows.length === 0) return [];
    return this.trials().find({ where: { id: In(rows.map((r) => r.id)) }, relations: FULL, order: { testedOn: 'DESC', createdAt: 'DESC' } });
  }

  summaryOf(trialId: string): Promise<TrialSummaryEntity | null> {
    return this.summaries().findOneBy({ trialId });
  }

  async publishedTrialIds(trialIds: string[]): Promise<Set<string>> {
    if (trialIds.length === 0) return new Set();
    const rows = await this.summaries().find({ where: { trialId: In(trialIds) }, select: { trialId: true } });
    return new Set(rows.map((r) => r.trialId));
  }

  clubAxes(clubId: string): Promise<AxeEntity[]> {
    return this.db.getRepository(AxeEntity).find({ where: { clubId }, order: { label: 'ASC' } });
  }

  findAxe(id: string): Promise<AxeEntity | null> {
    return this.db.getRepository(AxeEntity).findOneBy({ id });
  }

  clubAthletes(clubId: string): Promise<AthleteEntity[]> {
    return this.db.getRepository(AthleteEntity).find({ where: { clubId }, order: { lastName: 'ASC', firstName: 'ASC' } });
  }
}
