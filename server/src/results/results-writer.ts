import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { fromScoringStatus, officialTime, scoreMeetEvent, teamTotals, type Division } from '@endgrain/shared';
import type { EntityManager } from 'typeorm';

import type { MeetEventEntity } from '../meets/entities/meet-event.entity.js';
import type { MeetEntity } from '../meets/entities/meet.entity.js';
import type { MeetStandingEntity } from './entities/meet-standing.entity.js';
import type { ResultAuditAction, ResultAuditEntity } from './entities/result-audit.entity.js';
import { ResultEntity } from './entities/result.entity.js';
import { auditView, samePosted, type PostedResult } from './posted-result.js';
import { ResultsRepository } from './results.repository.js';

export interface ResultChange {
  entry: { id: string; meetEventId: string; clubId: string };
  posted: PostedResult;
}

export interface WriteOptions {
  userId: string | null;
  action: ResultAuditAction;
  reason: string | null;
}

export interface WriteOutcome {
  /** Results added or changed. */
  written: number;
  unchanged: number;
  meetEventIds: string[];
}

/** Fields the ranking fills in; compared to find rows whose stored values moved. */
const COMPUTED = ['finalStatus', 'finalReason', 'totalHundredths', 'place', 'tied', 'points', 'countsForClub', 'provisional'] as const;

/**
 * Saves posted results for one meet and, in the same transaction, re-ranks every meet event
 * they touch, rewrites the meet's club standings and logs each change. Identical re-posts
 * change nothing. The caller opens the transaction, so a failing row anywhere saves nothing.
 */
@Injectable()
export class ResultsWriter {
  constructor(@Inject(ResultsRepository) private readonly repo: ResultsRepository) {}

  async write(m: EntityManager, meet: MeetEntity, changes: readonly ResultChange[], options: WriteOptions): Promise<WriteOutcome> {
    const events = new Map((await this.repo.eventsOfMeet(m, meet.id)).map((e) => [e.id, e]));
    const touched = [...new Set(changes.map((c) => c.entry.meetEventId))];
    const all = await this.repo.resultsOfEvents(m, touched);
    const byEntry = new Map(all.map((r) => [r.entryId, r]));
    const before = new Map(all.map((r) => [r.id, { ...r }]));
    const audits: { result: ResultEntity; before: Record<string, unknown> | null }[] = [];
    let unchanged = 0;
    for (const change of changes) {
      const existing = byEntry.get(change.entry.id);
      if (existing && samePosted(existing, change.posted)) {
        unchanged += 1;
        continue;
      }
      const event = events.get(change.entry.meetEventId)!;
      const result = existing ?? newResult(meet, event, change.entry);
      audits.push({ result, before: existing ? auditView(existing) : null });
      Object.assign(result, change.posted, {
        timeHundredths: change.posted.rawTimes.length ? officialTime(change.posted.rawTimes).official : null,
        recordedBy: options.userId,
      });
      if (!existing) {
        all.push(result);
        byEntry.set(result.entryId, result);
      }
    }
    if (audits.length === 0) return { written: 0, unchanged, meetEventIds: [] };

    await rankAndStore(this.repo, m, meet, touched.map((id) => events.get(id)!), all, before);
    await this.repo.audit(m, audits.map(({ result, before: was }) => auditRow(result, was, options)));
    if (meet.status === 'CLOSED') await this.repo.setMeetStatus(m, meet.id, 'RUNNING');
    return { written: audits.length, unchanged, meetEventIds: touched };
  }
}

/**
 * After a meet's scoring changes: re-ranks every event with the meet's new scheme, rewrites the
 * standings, and logs each result whose place or points moved as a correction with the reason.
 * Runs in the caller's transaction. Returns how many results moved.
 */
export async function rescoreMeet(repo: ResultsRepository, m: EntityManager, meetId: string, options: { userId: string; reason: string }): Promise<number> {
  const meet = await repo.lockMeet(m, meetId);
  if (!meet) return 0;
  const events = await repo.eventsOfMeet(m, meetId);
  const all = await repo.resultsOfEvents(m, events.map((e) => e.id));
  if (all.length === 0) return 0;
  const before = new Map(all.map((r) => [r.id, { ...r }]));
  const dirty = await rankAndStore(repo, m, meet, events, all, before);
  const audit: WriteOptions = { userId: options.userId, action: 'CORRECTED', reason: `Scoring changed: ${options.reason}` };
  await repo.audit(m, dirty.map((r) => auditRow(r, auditView(before.get(r.id)!), audit)));
  return dirty.length;
}

/**
 * Ranks the given events' results, saves the rows that are new or whose values moved, and
 * rewrites the meet's standings. Returns the saved rows.
 */
async function rankAndStore(
  repo: ResultsRepository, m: EntityManager, meet: MeetEntity, events: readonly MeetEventEntity[], all: ResultEntity[], before: ReadonlyMap<string, ResultEntity>,
): Promise<ResultEntity[]> {
  const perEvent = groupBy(all, (r) => r.meetEventId);
  for (const event of events) rank(meet, event, perEvent.get(event.id) ?? []);
  const dirty = all.filter((r) => !before.has(r.id) || moved(before.get(r.id)!, r));
  await repo.upsert(m, dirty);
  await repo.replaceStandings(m, meet.id, standings(meet.id, await repo.standingInputs(m, meet.id)));
  return dirty;
}

function newResult(meet: MeetEntity, event: MeetEventEntity, entry: ResultChange['entry']): ResultEntity {
  return Object.assign(new ResultEntity(), {
    id: randomUUID(), entryId: entry.id, meetEventId: event.id, meetId: meet.id, seasonId: meet.seasonId, clubId: entry.clubId,
    eventTypeId: event.eventTypeId, division: event.division, meetDate: meet.startsOn,
  });
}

/** Ranks and scores one meet event, writing the computed fields onto its results. */
function rank(meet: MeetEntity, event: MeetEventEntity, results: ResultEntity[]): void {
  const scored = scoreMeetEvent(
    results.map((r) => ({
      id: r.id, clubId: r.clubId, status: r.status, timeHundredths: r.timeHundredths, score: r.score,
      penaltyHundredths: r.penaltyHundredths, reason: r.dqReason, runOffRank: r.runOffRank,
    })),
    { kind: event.eventType.resultKind, scoringScheme: event.scoringScheme, pointsTable: event.pointsTable, weight: event.weight, timeLimitHundredths: event.timeLimitHundredths },
    {
      scoringScheme: meet.scoringScheme, pointsTable: meet.pointsTable, bestEntryPerClub: Boolean(meet.bestEntryPerClub),
      minimumOnePoint: Boolean(meet.minimumOnePoint), runOffTopPlaces: meet.runOffTopPlaces,
    },
  );
  const byId = new Map(results.map((r) => [r.id, r]));
  for (const s of scored.results) {
    Object.assign(byId.get(s.id)!, {
      finalStatus: fromScoringStatus(s.status), finalReason: s.reason, totalHundredths: s.totalHundredths, place: s.place,
      tied: s.tied, points: s.points, countsForClub: s.countsForClub, provisional: s.provisional,
    });
  }
}

function moved(was: ResultEntity, now: ResultEntity): boolean {
  return !samePosted(was, now) || COMPUTED.some((key) => was[key] !== now[key]);
}

function standings(meetId: string, results: Awaited<ReturnType<ResultsRepository['standingInputs']>>): MeetStandingEntity[] {
  const totals = teamTotals([...groupBy(results, (r) => r.division)].map(([division, rows]) => ({ division, results: rows })));
  return totals.divisions.flatMap(({ division, clubs }) => {
    const provisional = results.some((r) => r.division === division && r.provisional);
    return clubs.map((c) => ({
      meetId, division: division as Division, clubId: c.clubId, points: c.points, place: c.place, tied: c.tied, placeCounts: c.placeCounts, provisional,
    }));
  });
}

function groupBy<T>(items: readonly T[], key: (item: T) => string): Map<string, T[]> {
  const groups = new Map<string, T[]>();
  for (const item of items) {
    const group = groups.get(key(item));
    if (group) group.push(item);
    else groups.set(key(item), [item]);
  }
  return groups;
}

function auditRow(result: ResultEntity, before: Record<string, unknown> | null, options: WriteOptions): Omit<ResultAuditEntity, 'createdAt'> {
  return {
    id: randomUUID(), resultId: result.id, entryId: result.entryId, meetId: result.meetId, userId: options.userId,
    action: before === null && options.action === 'CORRECTED' ? 'RECORDED' : options.action, reason: options.reason, before, after: auditView(result),
  };
}
