import { sampleStandardDeviation } from 'simple-statistics';

/**
 * Sample standard deviation (denominator n − 1). simple-statistics works in two passes
 * (mean first, then squared deviations), which keeps large offsets such as 10 000 002
 * from swallowing the spread the way a one-pass sum of squares does.
 */
export function sampleStdDev(values: readonly number[]): number {
  if (values.length < 2) throw new RangeError('sample standard deviation needs at least two values');
  return sampleStandardDeviation([...values]);
}
