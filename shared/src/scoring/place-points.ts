import type { ScoringScheme } from './scoring-scheme.js';

type PlaceScheme = Exclude<ScoringScheme, { type: 'percent-of-best' }>;

/**
 * Points for `count` results tied from points-place `place`: the mean of the points of the
 * places they cover, so two tied for 1st on a 10-8 table earn 9 each and nothing is lost.
 */
export function placePoints(scheme: PlaceScheme, fieldSize: number, place: number, count = 1): number {
  let sum = 0;
  for (let covered = place; covered < place + count; covered += 1) {
    sum += scheme.type === 'place-table' ? (scheme.points[covered - 1] ?? 0) : Math.max(fieldSize - covered + 1, 0);
  }
  return sum / count;
}
