import { describe, expect, it } from '@jest/globals';

import { poundsToGrams } from './pounds-to-grams.js';

describe('poundsToGrams', () => {
  it('gives exactly 453.59237 g for one pound', () => {
    // 1959 international pound (NIST SP 811 App. B.8): 1 lb = 0.45359237 kg exactly
    expect(poundsToGrams(1)).toBe(453.59237);
  });

  it('gives 1587.573295 g for a 3.5 lb head', () => {
    // hand-worked: 3.5 × 453.59237 = 1587.573295; a naive 3.5 * 453.59237 gives 1587.5732950000001
    expect(poundsToGrams(3.5)).toBe(1587.573295);
  });
});
