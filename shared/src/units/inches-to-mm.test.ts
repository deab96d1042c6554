import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import { inchesToMm } from './inches-to-mm.js';
import { mmToInches } from './mm-to-inches.js';

describe('inchesToMm', () => {
  it('converts a 12-inch block to exactly 304.8 mm', () => {
    // NIST SP 811 App. B.8: 1 in = 25.4 mm exactly; 12 in = 304.8 mm.
    expect(inchesToMm(12)).toBe(304.8);
  });

  it('converts a 14-inch block to exactly 355.6 mm', () => {
    // NIST SP 811 App. B.8: 14 in = 355.6 mm.
    expect(inchesToMm(14)).toBe(355.6);
  });

  it('converts a quarter-inch chisel to 6.35 mm', () => {
    // hand-worked: 0.25 × 25.4 = 6.35
    expect(inchesToMm(0.25)).toBe(6.35);
  });

  it('round-trips through mmToInches', () => {
    // property: inches → mm → inches returns the input to within float rounding
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1000, noNaN: true }), (inches) => {
        expect(mmToInches(inchesToMm(inches))).toBeCloseTo(inches, 10);
      }),
    );
  });
});
