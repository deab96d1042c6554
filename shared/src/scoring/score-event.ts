import { roundHalfUp } from '../units/round-half-up.js';
import { groupTies } from './group-ties.js';
import { percentOfBest } from './percent-of-best.js';
import { placePoints } from './place-points.js';
import type { RankedEvent, RankedResult, ResultKind } from './result-types.js';
import type { ScoringScheme } from './scoring-scheme.js';
import { ScoringInputError } from './scoring-input-error.js';

export interface ScoringOptions {
  /** Multiplies every point of the event, e.g. 1.5 for a technical event. Default 1. */
  weight?: number;
  /** Only each club's best entry scores; its other entries keep their place but earn 0. */
  bestEntryPerClubOnly?: boolean;
  /** Every scoring entry that ran (finished or did not finish) earns at least 1 point. */
  minimumOnePoint?: boolean;
  /** Default true. When false, a disqualified entry is owed the minimum point like one that did not finish. */
  dqEarnsNothing?: boolean;
}

export interface ScoredResult extends RankedResult {
  /** False for a club's extra entries under `bestEntryPerClubOnly`. */
  countsForClub: boolean;
  /** The place among scoring entries that the points are read from; null when it earns none by place. */
  pointsPlace: number | null;
  /** Rounded half up to two decimals after the weight. */
  points: number;
  /** Shared only until a pending run-off is run. */
  provisional: boolean;
}

export interface ScoredEvent {
  kind: ResultKind;
  results: ScoredResult[];
  provisional: boolean;
}

/**
 * Points for a ranked event.
 * - Tied results split the points of the places they cover (two tied for 1st on 10-8 earn 9
 *   each); a tie waiting for a run-off splits them too, marked provisional.
 * - With `bestEntryPerClubOnly`, a club's extra entries take no points place: the next
 *   club's entry moves up to the points of the place they would have used.
 * - Not-finished entries earn nothing by place. `minimumOnePoint` then lifts every scoring
 *   entry that ran (finished, did not finish, and disqualified when `dqEarnsNothing` is
 *   false) to 1 point; a scratch never ran and earns nothing. The minimum is a place point,
 *   so the weight applies to it too.
 * - Points are rounded half up to two decimals, once, after the weight.
 */
export function scoreEvent(event: RankedEvent, scheme: ScoringScheme, options: ScoringOptions = {}): ScoredEvent {
  const weight = options.weight ?? 1;
  checkScoring(scheme, weight);
  const counting = countingIds(event.results, options.bestEntryPerClubOnly ?? false);
  const pointsPlaces = pointsPlacesByPlace(event.results.filter((result) => counting.has(result.id)));
  const fieldSize =
    scheme.type === 'field-size' && scheme.countBy === 'clubs'
      ? new Set(event.results.map((result) => result.clubId)).size
      : event.results.length;
  const best = bestMeasure(event);

  const results = event.results.map((result): ScoredResult => {
    const countsForClub = counting.has(result.id);
    const slot = countsForClub && result.place !== null ? pointsPlaces.get(result.place) : undefined;
    let base = 0;
    if (slot && scheme.type === 'percent-of-best') base = percentOfBest(event.kind, measure(event.kind, result), best);
    else if (slot && scheme.type !== 'percent-of-best') base = placePoints(scheme, fieldSize, slot.place, slot.count);
    if (countsForClub && ranForMinimum(result, options)) base = Math.max(base, 1);
    return {
      ...result,
      countsForClub,
      pointsPlace: slot?.place ?? null,
      points: roundHalfUp(base * weight, 2),
      provisional: result.needsRunOff,
    };
  });
  return { kind: event.kind, results, provisional: event.runOffsPending };
}

/** The first entry of each club in rank order is its best. */
function countingIds(results: readonly RankedResult[], bestOnly: boolean): Set<string> {
  if (!bestOnly) return new Set(results.map((result) => result.id));
  const clubs = new Set<string>();
  const ids = new Set<string>();
  for (const result of results) {
    if (clubs.has(result.clubId)) continue;
    clubs.add(result.clubId);
    ids.add(result.id);
  }
  return ids;
}

/** Event place → the points place and the size of the tie among scoring entries. */
function pointsPlacesByPlace(scoring: readonly RankedResult[]): Map<number, { place: number; count: number }> {
  const placed = scoring.filter((result) => result.place !== null);
  const slots = new Map<number, { place: number; count: number }>();
  let ahead = 0;
  for (const group of groupTies(placed, (a, b) => a.place === b.place)) {
    const place = group[0]?.place;
    if (place !== null && place !== undefined) slots.set(place, { place: ahead + 1, count: group.length });
    ahead += group.length;
  }
  return slots;
}

function ranForMinimum(result: RankedResult, options: ScoringOptions): boolean {
  if (!options.minimumOnePoint) return false;
  if (result.status === 'disqualified') return options.dqEarnsNothing === false;
  return result.status === 'finished' || result.status === 'did-not-finish';
}

function measure(kind: ResultKind, result: RankedResult): number {
  return (kind === 'timed' ? result.totalHundredths : result.score) ?? 0;
}

function bestMeasure(event: RankedEvent): number {
  const measures = event.results
    .filter((result) => result.place !== null)
    .map((result) => measure(event.kind, result));
  if (measures.length === 0) return 0;
  return event.kind === 'scored' ? Math.max(...measures) : Math.min(...measures);
}

function checkScoring(scheme: ScoringScheme, weight: number): void {
  const fail = (message: string): never => {
    throw new ScoringInputError('invalid-option', message);
  };
  if (!Number.isFinite(weight) || weight <= 0) fail('an event weight is a positive number');
  if (scheme.type === 'place-table' && !scheme.points.every((points) => Number.isFinite(points) && points >= 0)) {
    fail('a place table holds non-negative numbers');
  }
  if (scheme.type === 'field-size' && scheme.countBy !== 'clubs' && scheme.countBy !== 'entries') {
    fail('a field-size scheme counts clubs or entries');
  }
}
