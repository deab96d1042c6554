import { chiSquareSurvival } from './chi-square-survival.js';
import { midRanks, tieTerm } from './mid-ranks.js';

export interface KruskalWallisResult {
  h: number;
  df: number;
  p: number;
  rankSums: number[];
  sizes: number[];
  /** 1 − Σ(t³ − t)/(N³ − N); H has already been divided by it. */
  tieCorrection: number;
}

/**
 * Kruskal–Wallis H across k groups with mid-ranks and the tie correction; p from the
 * chi-square distribution with k − 1 degrees of freedom (a large-sample approximation).
 */
export function kruskalWallis(groups: readonly (readonly number[])[]): KruskalWallisResult {
  const sizes = groups.map((g) => g.length);
  if (groups.length < 2 || sizes.some((size) => size === 0)) {
    throw new RangeError('Kruskal–Wallis needs at least two groups, none empty');
  }
  const pooled = groups.flat();
  const n = pooled.length;
  const { ranks, tieSizes } = midRanks(pooled);
  const rankSums: number[] = [];
  let offset = 0;
  for (const size of sizes) {
    rankSums.push(ranks.slice(offset, offset + size).reduce((sum, r) => sum + r, 0));
    offset += size;
  }
  const raw =
    (12 / (n * (n + 1))) * rankSums.reduce((sum, r, i) => sum + (r * r) / sizes[i]!, 0) - 3 * (n + 1);
  const tieCorrection = 1 - tieTerm(tieSizes) / (n * n * n - n);
  const df = groups.length - 1;
  // Every value tied: no ranking information at all.
  const h = tieCorrection > 0 ? Math.max(0, raw / tieCorrection) : 0;
  return { h, df, p: chiSquareSurvival(h, df), rankSums, sizes, tieCorrection };
}
