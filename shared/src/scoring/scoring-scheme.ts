/**
 * How an event's places turn into points.
 * - `place-table`: the nth place earns `points[n - 1]`; places past the table earn 0.
 * - `field-size`: 1st earns as many points as there are clubs (or entries) in the event,
 *   each lower place one less, never below 0. The field is every entry passed in,
 *   whatever its status: a club that entered counts even if its athlete scratched.
 * - `percent-of-best`: our stated choice of formula: 100 × best ÷ own for timed and
 *   fewest-hits events, 100 × own ÷ best for scored ones; the winner earns 100.
 */
export type ScoringScheme =
  | { type: 'place-table'; points: readonly number[] }
  | { type: 'field-size'; countBy: 'clubs' | 'entries' }
  | { type: 'percent-of-best' };

/** Tables in common use; a meet may also give its own. */
export const placeTablePresets = {
  sevenToOne: [7, 6, 5, 4, 3, 2, 1],
  fiveToZero: [5, 4, 3, 2, 1, 0],
} as const satisfies Record<string, readonly number[]>;
