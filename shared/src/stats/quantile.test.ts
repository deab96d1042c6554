import { describe, expect, it } from '@jest/globals';

import { median } from './median.js';
import { quantile } from './quantile.js';
import { quartiles } from './quartiles.js';

// Worked list {15, 20, 35, 40, 50} from the percentile article's worked examples.
const WORKED = [15, 20, 35, 40, 50];

describe('quantile', () => {
  it('gives 29 for the 40th percentile by the linear method (type 7)', () => {
    // Worked example: 29. Hand-worked: position (5 − 1)·0.4 = 1.6 → 20 + 0.6·(35 − 20) = 29.
    expect(quantile(WORKED, 0.4)).toBeCloseTo(29, 12);
  });

  it('gives 26 for the 40th percentile by the (N + 1)p method (type 6)', () => {
    // Worked example: 26. Hand-worked: position 6·0.4 = 2.4 → 20 + 0.4·(35 − 20) = 26.
    expect(quantile(WORKED, 0.4, { method: 'type-6' })).toBeCloseTo(26, 12);
  });

  it('does not depend on the order of the values', () => {
    // Same worked list, reversed; the 40th percentile must still be 29.
    expect(quantile([...WORKED].reverse(), 0.4)).toBeCloseTo(29, 12);
  });

  it('clamps type 6 to the sample ends outside its defined range', () => {
    // Hand-worked: position 6·0.1 = 0.6 < 1, so the smallest value, 15, stands.
    expect(quantile(WORKED, 0.1, { method: 'type-6' })).toBe(15);
  });

  it('refuses an empty sample and p outside [0, 1]', () => {
    expect(() => quantile([], 0.5)).toThrow(RangeError);
    expect(() => quantile(WORKED, 1.2)).toThrow(RangeError);
  });
});

describe('median and quartiles', () => {
  it('takes the middle value, or the mean of the middle two', () => {
    // Hand-worked: odd count → 35; even count {15, 20, 35, 40} → (20 + 35)/2 = 27.5.
    expect(median(WORKED)).toBe(35);
    expect(median([40, 15, 35, 20])).toBe(27.5);
  });

  it('places the quartiles by the linear method', () => {
    // Hand-worked type 7: q1 at position 4·0.25 = 1 → 20; q3 at position 3 → 40.
    expect(quartiles(WORKED)).toEqual({ q1: 20, median: 35, q3: 40 });
  });
});
