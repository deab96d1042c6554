import { numericSort, quantileSorted } from 'simple-statistics';

import { seededRandom } from './seeded-random.js';

/** Endgrain's fixed defaults, stated so a published interval can be reproduced. */
export const BOOTSTRAP_DEFAULTS = { resamples: 2000, seed: 20_190_417, level: 0.95 } as const;

export interface BootstrapOptions {
  resamples?: number;
  seed?: number;
  level?: number;
}

export interface BootstrapInterval {
  estimate: number;
  low: number;
  high: number;
  level: number;
  resamples: number;
  seed: number;
  method: 'percentile';
}

/**
 * Percentile bootstrap interval for the median: resample with
 * replacement, take each resample's median, and read the type-7 quantiles at
 * (1 − level)/2 and (1 + level)/2. The sample is sorted first, so the interval does not
 * depend on the order the values arrived in.
 */
export function bootstrapMedianInterval(
  values: readonly number[],
  options: BootstrapOptions = {},
): BootstrapInterval {
  const { resamples, seed, level } = { ...BOOTSTRAP_DEFAULTS, ...options };
  if (values.length === 0) throw new RangeError('bootstrap needs at least one value');
  if (!(level > 0 && level < 1)) throw new RangeError(`level must be within (0, 1), got ${level}`);
  const sorted = numericSort([...values]);
  const random = seededRandom(seed);
  const n = sorted.length;
  const estimates = new Array<number>(resamples);
  const resample = new Array<number>(n);
  for (let r = 0; r < resamples; r++) {
    for (let i = 0; i < n; i++) resample[i] = sorted[Math.floor(random() * n)] as number;
    resample.sort((a, b) => a - b);
    estimates[r] = medianOfSorted(resample);
  }
  estimates.sort((a, b) => a - b);
  return {
    estimate: medianOfSorted(sorted),
    low: quantileSorted(estimates, (1 - level) / 2),
    high: quantileSorted(estimates, (1 + level) / 2),
    level,
    resamples,
    seed,
    method: 'percentile',
  };
}

function medianOfSorted(sorted: number[]): number {
  return quantileSorted(sorted, 0.5);
}
