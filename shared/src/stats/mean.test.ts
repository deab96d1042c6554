import { describe, expect, it } from '@jest/globals';

import { mean } from './mean.js';
import { sampleStdDev } from './sample-std-dev.js';

// NIST StRD univariate summary statistics, dataset Mavro (certified values, n = 50).
const MAVRO = [
  2.0018, 2.0017, 2.0018, 2.0019, 2.0018, 2.0017, 2.0015, 2.0014, 2.0015, 2.0015, 2.0017, 2.0018,
  2.0018, 2.0019, 2.0019, 2.0021, 2.002, 2.0016, 2.0014, 2.0013, 2.0013, 2.0015, 2.0015, 2.0016,
  2.0015, 2.0014, 2.0013, 2.0014, 2.0015, 2.0014, 2.0015, 2.0016, 2.0015, 2.0016, 2.0019, 2.002,
  2.002, 2.0021, 2.0022, 2.0023, 2.0024, 2.0025, 2.0027, 2.0026, 2.0026, 2.0026, 2.0027, 2.0026,
  2.0025, 2.0024,
];

function relativeError(actual: number, certified: number): number {
  return Math.abs(actual - certified) / Math.abs(certified);
}

describe('mean and sample standard deviation against NIST StRD certified values', () => {
  it('matches NumAcc1, the trap for one-pass sums of squares', () => {
    // NIST StRD NumAcc1 = {10000001, 10000003, 10000002}: certified mean 10000002, s = 1.
    const numAcc1 = [10000001, 10000003, 10000002];
    expect(mean(numAcc1)).toBe(10000002);
    expect(sampleStdDev(numAcc1)).toBe(1);
  });

  it('matches Mavro to better than 1e-12 relative', () => {
    expect(MAVRO).toHaveLength(50);
    // NIST StRD Mavro: certified mean 2.00185600000000, s = 0.000429123454003053.
    expect(relativeError(mean(MAVRO), 2.001856)).toBeLessThan(1e-12);
    expect(relativeError(sampleStdDev(MAVRO), 0.000429123454003053)).toBeLessThan(1e-12);
  });

  it('refuses samples too small for the statistic', () => {
    expect(() => mean([])).toThrow(RangeError);
    expect(() => sampleStdDev([3])).toThrow(RangeError);
  });
});
