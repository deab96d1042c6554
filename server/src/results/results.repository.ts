import { Inject, Injectable } from '@nestjs/common';
import { DataSource, In, type EntityManager } from 'typeorm';

import { MeetEventEntity } from '../meets/entities/meet-event.entity.js';
import { MeetEntity } from '../meets/entities/meet.entity.js';
import { MeetStandingEntity } from './entities/meet-standing.entity.js';
import { ResultAuditEntity } from './entities/result-audit.entity.js';
import { ResultEntity } from './entities/result.entity.js';

/** Columns written on every upsert: all but the keys and the creation time. */
const UPSERT_COLUMNS = [
  'entry_id', 'meet_event_id', 'meet_id', 'season_id', 'club_id', 'event_type_id', 'division', 'meet_date', 'status', 'dq_reason',
  'raw_times', 'time_hundredths', 'score', 'penalty_hundredths', 'run_off_rank', 'final_status', 'final_reason', 'total_hundredths',
  'place', 'tied', 'points', 'counts_for_club', 'provisional', 'axe_id', 'axe_label', 'grind', 'bevel_included_deg', 'chisel_width_mm',
  'species_id', 'diameter_mm', 'block_condition', 'recorded_by',
] as const;
const CHUNK = 500;

/** Writes of results, meet standings and the audit log; always inside the caller's transaction. */
@Injectable()
export class ResultsRepository {
  constructor(@Inject(DataSource) readonly db: DataSource) {}

  /** Locks the meet row so two people saving the same meet re-rank one after the other. */
  lockMeet(m: EntityManager, meetId: string): Promise<MeetEntity | null> {
    return m.getRepository(MeetEntity).findOne({ where: { id: meetId }, lock: { mode: 'pessimistic_write' } });
  }

  eventsOfMeet(m: EntityManager, meetId: string): Promise<MeetEventEntity[]> {
    return m.getRepository(MeetEventEntity).find({ where: { meetId }, relations: { eventType: true }, order: { position: 'ASC' } });
  }

  resultsOfEvents(m: EntityManager, meetEventIds: readonly string[]): Promise<ResultEntity[]> {
    if (meetEventIds.length === 0) return Promise.resolve([]);
    return m.getRepository(ResultEntity).find({ where: { meetEventId: In([...meetEventIds]) } });
  }

  /** Multi-row INSERT … ON DUPLICATE KEY UPDATE, in chunks; the natural key is the entry. */
  async upsert(m: EntityManager, rows: readonly ResultEntity[]): Promise<void> {
    for (let start = 0; start < rows.length; start += CHUNK) {
      const chunk = rows.slice(start, start + CHUNK);
      const values: unknown[] = [];
      for (const row of chunk) values.push(row.id, ...UPSERT_COLUMNS.map((column) => columnValue(row, column)));
      const placeholders = chunk.map(() => `(${new Array(UPSERT_COLUMNS.length + 1).fill('?').join(',')})`).join(',');
      const updates = UPSERT_COLUMNS.filter((c) => c !== 'entry_id').map((c) => `${c} = VALUES(${c})`).join(', ');
      await m.query(`INSERT INTO results (id, ${UPSERT_COLUMNS.join(', ')}) VALUES ${placeholders} ON DUPLICATE KEY UPDATE ${updates}`, values);
    }
  }

  /** What the meet standings are made of: every result's club, division, place and points. */
  standingInputs(m: EntityManager, meetId: string): Promise<Pick<ResultEntity, 'clubId' | 'division' | 'place' | 'points' | 'countsForClub' | 'provisional'>[]> {
    return m.getRepository(ResultEntity).find({
      where: { meetId },
      select: { id: true, clubId: true, division: true, place: true, points: true, countsForClub: true, provisional: true },
    });
  }

  async replaceStandings(m: EntityManager, meetId: string, rows: readonly MeetStandingEntity[]): Promise<void> {
    await m.getRepository(MeetStandingEntity).delete({ meetId });
    for (let start = 0; start < rows.length; start += CHUNK) await m.getRepository(MeetStandingEntity).insert(rows.slice(start, start + CHUNK));
  }

  async audit(m: EntityManager, rows: readonly Omit<ResultAuditEntity, 'createdAt'>[]): Promise<void> {
    for (let start = 0; start < rows.length; start += CHUNK) {
      const chunk = rows.slice(start, start + CHUNK);
      const values = chunk.flatMap((r) => [r.id, r.resultId, r.entryId, r.meetId, r.userId, r.action, r.reason, json(r.before), JSON.stringify(r.after)]);
      await m.query(
        `INSERT INTO result_audit (id, result_id, entry_id, meet_id, user_id, action, reason, \`before\`, \`after\`) VALUES ${chunk.map(() => '(?,?,?,?,?,?,?,?,?)').join(',')}`,
        values,
      );
    }
  }

  async setMeetStatus(m: EntityManager, meetId: string, status: MeetEntity['status']): Promise<void> {
    await m.getRepository(MeetEntity).update({ id: meetId }, { status });
  }
}

function json(value: unknown): string | null {
  return value === null || value === undefined ? null : JSON.stringify(value);
}

const PROPERTY: Record<(typeof UPSERT_COLUMNS)[number], keyof ResultEntity> = {
  entry_id: 'entryId', meet_event_id: 'meetEventId', meet_id: 'meetId', season_id: 'seasonId', club_id: 'clubId', event_type_id: 'eventTypeId',
  division: 'division', meet_date: 'meetDate', status: 'status', dq_reason: 'dqReason', raw_times: 'rawTimes', time_hundredths: 'timeHundredths',
  score: 'score', penalty_hundredths: 'penaltyHundredths', run_off_rank: 'runOffRank', final_status: 'finalStatus', final_reason: 'finalReason',
  total_hundredths: 'totalHundredths', place: 'place', tied: 'tied', points: 'points', counts_for_club: 'countsForClub', provisional: 'provisional',
  axe_id: 'axeId', axe_label: 'axeLabel', grind: 'grind', bevel_included_deg: 'bevelIncludedDeg', chisel_width_mm: 'chiselWidthMm',
  species_id: 'speciesId', diameter_mm: 'diameterMm', block_condition: 'blockCondition', recorded_by: 'recordedBy',
};

function columnValue(row: ResultEntity, column: (typeof UPSERT_COLUMNS)[number]): unknown {
  const value = row[PROPERTY[column]];
  if (column === 'raw_times') return JSON.stringify(value);
  if (typeof value === 'boolean') return value ? 1 : 0;
  return value ?? null;
}
