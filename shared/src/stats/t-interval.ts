import { mean } from './mean.js';
import { sampleStdDev } from './sample-std-dev.js';
import { studentTQuantile } from './student-t-quantile.js';

export interface TInterval {
  n: number;
  mean: number;
  sd: number;
  standardError: number;
  df: number;
  /** t statistic for the hypothesis that the true mean is 0. */
  t: number;
  tCritical: number;
  level: number;
  low: number;
  high: number;
}

/** Student t confidence interval for a mean: mean ± t(1 − α/2, n − 1) · s / √n. */
export function tInterval(values: readonly number[], options: { level?: number } = {}): TInterval {
  const level = options.level ?? 0.95;
  if (!(level > 0 && level < 1)) throw new RangeError(`level must be within (0, 1), got ${level}`);
  const n = values.length;
  const m = mean(values);
  const sd = sampleStdDev(values);
  const standardError = sd / Math.sqrt(n);
  const df = n - 1;
  const tCritical = studentTQuantile((1 + level) / 2, df);
  return {
    n,
    mean: m,
    sd,
    standardError,
    df,
    t: m / standardError,
    tCritical,
    level,
    low: m - tCritical * standardError,
    high: m + tCritical * standardError,
  };
}
