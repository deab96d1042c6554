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
  // A resample drawn from the sorted sample is ordered as its drawn indices are, so its median
  // is read from a count of how often each index was drawn: linear time, no sort per resample.
  // The same draws give the same medians, to the last bit, as sorting each resample would.
  const counts = new Uint32Array(n);
  const h = (n - 1) * 0.5;
  const lower = Math.floor(h);
  const upper = Math.ceil(h);
  for (let r = 0; r < resamples; r++) {
    counts.fill(0);
    for (let i = 0; i < n; i++) counts[Math.floor(random() * n)]! += 1;
    let seen = 0;
    let j = 0;
    while (seen + counts[j]! <= lower) seen += counts[j++]!;
    const low = sorted[j] as number;
    while (seen + counts[j]! <= upper) seen += counts[j++]!;
    const high = sorted[j] as number;
    estimates[r] = lower === upper ? low : low + (h - lower) * (high - low);
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
