import { numericSort, quantileSorted } from 'simple-statistics';

/**
 * Hyndman–Fan sample quantile definitions offered by Endgrain.
 * `type-7` (Endgrain's default): linear interpolation at position (n − 1)p, the usual
 * spreadsheet method; simple-statistics' quantileSorted implements exactly this one.
 * `type-6`: interpolation at position (n + 1)p, clamped to the sample's ends.
 */
export type QuantileMethod = 'type-7' | 'type-6';

export interface QuantileOptions {
  method?: QuantileMethod;
}

export function quantile(values: readonly number[], p: number, options: QuantileOptions = {}): number {
  if (values.length === 0) throw new RangeError('quantile needs at least one value');
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile p must be within [0, 1], got ${p}`);
  const sorted = numericSort([...values]);
  if ((options.method ?? 'type-7') === 'type-7') return quantileSorted(sorted, p);
  return type6Sorted(sorted, p);
}

function type6Sorted(sorted: readonly number[], p: number): number {
  const n = sorted.length;
  // 1-based position (n + 1)p; outside [1, n] the sample's end values stand.
  const position = Math.min(Math.max((n + 1) * p, 1), n);
  const lower = Math.floor(position);
  const fraction = position - lower;
  const low = sorted[lower - 1] as number;
  if (fraction === 0) return low;
  const high = sorted[lower] as number;
  return low + fraction * (high - low);
}
