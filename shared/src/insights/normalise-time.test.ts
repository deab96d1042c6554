import { describe, expect, it } from '@jest/globals';

import { normaliseTime } from './normalise-time.js';

describe('normaliseTime', () => {
  it('brings a time on a bigger block down to the 300 mm reference', () => {
    // Hand-worked: 30.00 s on 350 mm → 3000 × (300/350)² = 3000 × 36/49 = 2204.08 hundredths.
    expect(normaliseTime(3000, 350)).toBeCloseTo(2204.0816, 4);
  });

  it('brings a time on a smaller block up', () => {
    // Hand-worked: 3000 × (300/250)² = 3000 × 1.44 = 4320.
    expect(normaliseTime(3000, 250)).toBeCloseTo(4320, 9);
  });

  it('uses the stated reference and exponent', () => {
    // Hand-worked: 12-inch reference (304.8 mm, exact) with a 14-inch block (355.6 mm) and exponent 1:
    // 3000 × 12/14 = 2571.43. Exponent 0 leaves any time alone.
    expect(normaliseTime(3000, 355.6, { referenceMm: 304.8, exponent: 1 })).toBeCloseTo(2571.4286, 4);
    expect(normaliseTime(3000, 355.6, { exponent: 0 })).toBe(3000);
    expect(normaliseTime(4567, 300)).toBe(4567);
  });

  it('refuses a block without a diameter', () => {
    expect(() => normaliseTime(3000, 0)).toThrow(RangeError);
  });
});
