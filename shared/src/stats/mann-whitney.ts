import { midRanks, tieTerm } from './mid-ranks.js';
import { normalCdf } from './normal-cdf.js';

/** Exact p-values are used below this size in each sample when there are no ties. */
export const MANN_WHITNEY_EXACT_BELOW = 50;

export interface MannWhitneyResult {
  /** Pairs (xᵢ, yⱼ) with xᵢ > yⱼ, ties counting ½: W_x − m(m + 1)/2. */
  uX: number;
  uY: number;
  nX: number;
  nY: number;
  method: 'exact' | 'normal-approximation';
  /** P(U ≥ u_x): evidence that x tends to be larger. */
  pGreater: number;
  /** P(U ≤ u_x): evidence that x tends to be smaller. */
  pLess: number;
  pTwoSided: number;
}

/**
 * Mann–Whitney U (Wilcoxon rank-sum) test. Without ties and with both samples smaller than
 * MANN_WHITNEY_EXACT_BELOW the p-values are exact, from the count of rank arrangements;
 * otherwise a normal approximation with the tie-corrected variance and a continuity
 * correction of ½ is used.
 */
export function mannWhitney(x: readonly number[], y: readonly number[]): MannWhitneyResult {
  const nX = x.length;
  const nY = y.length;
  if (nX === 0 || nY === 0) throw new RangeError('Mann–Whitney needs at least one value in each sample');
  const { ranks, tieSizes } = midRanks([...x, ...y]);
  const rankSumX = ranks.slice(0, nX).reduce((sum, r) => sum + r, 0);
  const uX = rankSumX - (nX * (nX + 1)) / 2;
  const uY = nX * nY - uX;
  const exact = tieSizes.length === 0 && nX < MANN_WHITNEY_EXACT_BELOW && nY < MANN_WHITNEY_EXACT_BELOW;
  const { pLess, pGreater } = exact ? exactTails(uX, nX, nY) : normalTails(uX, nX, nY, tieTerm(tieSizes));
  return {
    uX,
    uY,
    nX,
    nY,
    method: exact ? 'exact' : 'normal-approximation',
    pGreater,
    pLess,
    pTwoSided: Math.min(1, 2 * Math.min(pLess, pGreater)),
  };
}

function exactTails(uX: number, nX: number, nY: number): { pLess: number; pGreater: number } {
  const counts = uCounts(nX, nY);
  const total = counts.reduce((sum, c) => sum + c, 0n);
  let atMost = 0n;
  let atLeast = 0n;
  counts.forEach((count, u) => {
    if (u <= uX) atMost += count;
    if (u >= uX) atLeast += count;
  });
  return { pLess: ratio(atMost, total), pGreater: ratio(atLeast, total) };
}

/**
 * Number of arrangements giving each U for samples of m and n: the coefficients of the
 * Gaussian binomial [m + n choose m]_q = Π_{i=1..m} (1 − q^{n+i}) / (1 − q^i), in exact
 * integers because the counts outgrow doubles well before 50 + 50.
 */
function uCounts(m: number, n: number): bigint[] {
  const counts = new Array<bigint>(m * n + 1).fill(0n);
  counts[0] = 1n;
  for (let i = 1; i <= m; i++) {
    for (let k = m * n; k >= n + i; k--) counts[k] = counts[k]! - counts[k - n - i]!;
    for (let k = i; k <= m * n; k++) counts[k] = counts[k]! + counts[k - i]!;
  }
  return counts;
}

function ratio(numerator: bigint, denominator: bigint): number {
  // Scale before converting so both stay exact enough for a 16-digit quotient.
  const scale = 10n ** 18n;
  return Number((numerator * scale) / denominator) / 1e18;
}

function normalTails(uX: number, nX: number, nY: number, ties: number): { pLess: number; pGreater: number } {
  const n = nX + nY;
  const variance = ((nX * nY) / 12) * (n + 1 - ties / (n * (n - 1)));
  const centre = (nX * nY) / 2;
  if (variance <= 0) return { pLess: 1, pGreater: 1 };
  const sd = Math.sqrt(variance);
  return {
    pLess: normalCdf((uX - centre + 0.5) / sd),
    pGreater: 1 - normalCdf((uX - centre - 0.5) / sd),
  };
}
