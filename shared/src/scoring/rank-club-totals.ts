import { roundHalfUp } from '../units/round-half-up.js';
import { compareCodeUnits } from './compare-code-units.js';
import { groupTies } from './group-ties.js';
import { placeGroups } from './place-groups.js';

export const meetTieBreak =
  'Clubs level on points are separated by the most event first places, then the most second places, ' +
  'and so on down the places; clubs still level share the place.';

export const seasonTieBreak =
  "Clubs level on season points are separated by the most event first places across the season's meets, " +
  'then the most second places, and so on down the places; clubs still level share the place.';

interface Total {
  clubId: string;
  points: number;
  placeCounts: number[];
}

/**
 * Orders club totals by points (rounded half up to two decimals first, so sums that differ
 * only by float noise tie), then by countback of place counts; ties share the place.
 */
export function rankClubTotals<T extends Total>(totals: readonly T[]): (T & { place: number; tied: boolean })[] {
  const rounded = totals.map((total) => ({ ...total, points: roundHalfUp(total.points, 2) }));
  const compare = (a: T, b: T): number => b.points - a.points || countback(a.placeCounts, b.placeCounts);
  const sorted = rounded.sort((a, b) => compare(a, b) || compareCodeUnits(a.clubId, b.clubId));
  return placeGroups(groupTies(sorted, (a, b) => compare(a, b) === 0)).map(({ item, place, tied }) => ({
    ...item,
    place,
    tied,
  }));
}

/** Negative when `a` has more of the first place where the two differ. */
function countback(a: readonly number[], b: readonly number[]): number {
  for (let index = 0; index < Math.max(a.length, b.length); index += 1) {
    const difference = (b[index] ?? 0) - (a[index] ?? 0);
    if (difference !== 0) return difference;
  }
  return 0;
}
