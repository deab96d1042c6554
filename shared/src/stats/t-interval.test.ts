import { describe, expect, it } from '@jest/globals';

import { tInterval } from './t-interval.js';

// Student (1908) sleep data, paired differences (R datasets::sleep, group 2 − group 1).
const SLEEP_DIFFERENCES = [1.2, 2.4, 1.3, 1.3, 0.0, 1.0, 1.8, 0.8, 4.6, 1.4];

describe('tInterval', () => {
  it('reproduces the sleep-data paired t interval', () => {
    const result = tInterval(SLEEP_DIFFERENCES);
    // Published worked example: mean 1.58, s = 1.2299955, t = 4.062128, 95 % CI (0.7001142, 2.4598858).
    expect(result.mean).toBeCloseTo(1.58, 12);
    expect(result.sd).toBeCloseTo(1.2299955, 7);
    expect(result.t).toBeCloseTo(4.062128, 6);
    expect(result.df).toBe(9);
    expect(result.low).toBeCloseTo(0.7001142, 7);
    expect(result.high).toBeCloseTo(2.4598858, 7);
  });

  it('narrows at a lower confidence level', () => {
    // Property of any t interval: the 80 % interval sits inside the 95 % one.
    const wide = tInterval(SLEEP_DIFFERENCES);
    const narrow = tInterval(SLEEP_DIFFERENCES, { level: 0.8 });
    expect(narrow.low).toBeGreaterThan(wide.low);
    expect(narrow.high).toBeLessThan(wide.high);
  });
});
