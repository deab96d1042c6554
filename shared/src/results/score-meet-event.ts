import type { EventResultKind } from '../league/event-catalogue.js';
import { rankResults } from '../scoring/rank-results.js';
import type { ResultKind } from '../scoring/result-types.js';
import { scoreEvent, type ScoredEvent } from '../scoring/score-event.js';
import type { ScoringScheme } from '../scoring/scoring-scheme.js';
import { toScoringStatus, type PostedStatus } from './posted-statuses.js';

export type SchemeValue = 'FIXED_TABLE' | 'FIELD_SIZE' | 'PERCENT_OF_BEST';

/** A meet's scoring settings as the meet builder stores them. */
export interface MeetScoring {
  scoringScheme: SchemeValue;
  pointsTable: readonly number[] | null;
  bestEntryPerClub: boolean;
  minimumOnePoint: boolean;
  runOffTopPlaces: number;
}

/** A meet event's own settings; a null scheme follows the meet's. */
export interface EventScoring {
  kind: EventResultKind;
  scoringScheme: SchemeValue | null;
  pointsTable: readonly number[] | null;
  weight: number;
  timeLimitHundredths: number | null;
}

/** A stored result as the engine needs it (penalties kept in hundredths, like times). */
export interface StoredResult {
  id: string;
  clubId: string;
  status: PostedStatus;
  timeHundredths: number | null;
  score: number | null;
  penaltyHundredths: number;
  reason: string | null;
  runOffRank: number | null;
}

const KINDS: Record<EventResultKind, ResultKind> = { TIMED: 'timed', SCORED: 'scored', FEWEST_HITS: 'fewest-hits' };

export function toResultKind(kind: EventResultKind): ResultKind {
  return KINDS[kind];
}

/** The scheme an event scores by: its own when the host set one, otherwise the meet's. */
export function eventScheme(meet: MeetScoring, event: EventScoring): ScoringScheme {
  const value = event.scoringScheme ?? meet.scoringScheme;
  if (value === 'FIELD_SIZE') return { type: 'field-size', countBy: 'clubs' };
  if (value === 'PERCENT_OF_BEST') return { type: 'percent-of-best' };
  const table = (event.scoringScheme ? event.pointsTable : null) ?? meet.pointsTable ?? [];
  return { type: 'place-table', points: table };
}

/**
 * Ranks and scores one meet event's stored results with the meet's settings: the bridge
 * between the database's spellings and the scoring engine. A DQ earns nothing (DESIGN.md).
 */
export function scoreMeetEvent(results: readonly StoredResult[], event: EventScoring, meet: MeetScoring): ScoredEvent {
  const ranked = rankResults(
    results.map((r) => ({
      id: r.id,
      clubId: r.clubId,
      status: toScoringStatus(r.status),
      timeHundredths: r.timeHundredths,
      score: r.score,
      penaltySeconds: r.penaltyHundredths / 100,
      reason: r.reason,
      runOffRank: r.runOffRank,
    })),
    { kind: toResultKind(event.kind), timeLimitHundredths: event.timeLimitHundredths, runOffTopPlaces: meet.runOffTopPlaces },
  );
  return scoreEvent(ranked, eventScheme(meet, event), {
    weight: event.weight,
    bestEntryPerClubOnly: meet.bestEntryPerClub,
    minimumOnePoint: meet.minimumOnePoint,
    dqEarnsNothing: true,
  });
}
