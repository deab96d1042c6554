import type { ResultKind } from './result-types.js';

/**
 * Our stated choice of percentage formula (no published one): 100 × best ÷ own where lower
 * wins (timed, fewest hits), 100 × own ÷ best where higher wins (scored). The best earns 100.
 */
export function percentOfBest(kind: ResultKind, own: number, best: number): number {
  if (kind === 'scored') return best > 0 ? (100 * own) / best : 0;
  // Only a fewest-hits event can have a best of 0 hits; that entry alone earns 100.
  return own === 0 ? 100 : (100 * best) / own;
}
