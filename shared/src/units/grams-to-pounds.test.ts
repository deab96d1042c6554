import { describe, expect, it } from '@jest/globals';

import { gramsToPounds } from './grams-to-pounds.js';

describe('gramsToPounds', () => {
  it('gives 2.20462262184878 lb for one kilogram', () => {
    // NIST SP 811 App. B.8 / 1959 international pound: 1 kg = 2.20462262184878 lb
    expect(gramsToPounds(1000)).toBeCloseTo(2.20462262184878, 13);
  });

  it('gives exactly 1 lb for 453.59237 g', () => {
    // 1959 international pound: 1 lb = 0.45359237 kg exactly
    expect(gramsToPounds(453.59237)).toBe(1);
  });
});
