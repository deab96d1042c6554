import { bootstrapMedianInterval, type BootstrapOptions } from '../stats/index.js';
import type { AthleteRatio } from './within-athlete-ratios.js';

export interface RatioEffect {
  /** Median within-athlete ratio; below 1 is faster than usual. */
  median: number;
  low: number;
  high: number;
  results: number;
  athletes: number;
  /** The interval excludes 1 (no difference). */
  excludesNoDifference: boolean;
}

/** A group's effect: the median of its within-athlete ratios with a bootstrap interval. */
export function ratioEffect(ratios: readonly AthleteRatio[], bootstrap: BootstrapOptions = {}): RatioEffect | null {
  const usable = ratios.filter((r) => r.ratio !== null);
  if (usable.length === 0) return null;
  const interval = bootstrapMedianInterval(
    usable.map((r) => r.ratio!),
    bootstrap,
  );
  return {
    median: interval.estimate,
    low: interval.low,
    high: interval.high,
    results: usable.length,
    athletes: new Set(usable.map((r) => r.athleteId)).size,
    excludesNoDifference: interval.high < 1 || interval.low > 1,
  };
}
