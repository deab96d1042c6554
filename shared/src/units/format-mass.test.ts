import { describe, expect, it } from '@jest/globals';

import { formatMass } from './format-mass.js';

describe('formatMass', () => {
  it('prints a 3.5 lb head as 1.59 kg', () => {
    // hand-worked: 3.5 × 453.59237 g = 1587.573295 g = 1.587… kg → 1.59 kg
    expect(formatMass(1587.573295, 'metric')).toBe('1.59 kg');
  });

  it('prints the same head as 3.5 lb', () => {
    // 1959 international pound: 1587.573295 g / 453.59237 g = 3.5 lb exactly
    expect(formatMass(1587.573295, 'imperial')).toBe('3.5 lb');
  });

  it('prints one kilogram in pounds to the requested digits', () => {
    // NIST SP 811 App. B.8: 1 kg = 2.20462262184878 lb → 2.205 at three decimals
    expect(formatMass(1000, 'imperial', { digits: 3 })).toBe('2.205 lb');
  });
});
