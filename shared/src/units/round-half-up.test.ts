import { describe, expect, it } from '@jest/globals';

import { roundHalfUp } from './round-half-up.js';

describe('roundHalfUp', () => {
  it('rounds a decimal half up even where binary floats fall short of it', () => {
    // hand-worked: 1.005 → 1.01 and 2.675 → 2.68 in decimal; Math.round(1.005 * 100) / 100 gives 1
    expect(roundHalfUp(1.005, 2)).toBe(1.01);
    expect(roundHalfUp(2.675, 2)).toBe(2.68);
  });

  it('rounds a half away from zero for negatives', () => {
    // hand-worked: -2.5 → -3 (halves away from zero), -2.4 → -2
    expect(roundHalfUp(-2.5, 0)).toBe(-3);
    expect(roundHalfUp(-2.4, 0)).toBe(-2);
  });

  it('never returns negative zero', () => {
    // hand-worked: -0.004 rounds to 0 at two decimals; Object.is tells 0 from -0
    expect(Object.is(roundHalfUp(-0.004, 2), 0)).toBe(true);
  });

  it('handles values printed in exponent form', () => {
    // hand-worked: 1.5e-7 at 7 decimals is 0.0000002 (half rounds up)
    expect(roundHalfUp(1.5e-7, 7)).toBe(2e-7);
  });

  it('refuses a non-finite value', () => {
    expect(() => roundHalfUp(Number.NaN, 2)).toThrow(RangeError);
  });
});
