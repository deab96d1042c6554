import { median as ssMedian } from 'simple-statistics';

/** Middle value of a sample (mean of the two middle values for an even count). */
export function median(values: readonly number[]): number {
  if (values.length === 0) throw new RangeError('median needs at least one value');
  return ssMedian([...values]);
}
