import { mean as ssMean } from 'simple-statistics';

/** Arithmetic mean; simple-statistics sums with error compensation (Kahan–Babuška). */
export function mean(values: readonly number[]): number {
  if (values.length === 0) throw new RangeError('mean needs at least one value');
  return ssMean([...values]);
}
