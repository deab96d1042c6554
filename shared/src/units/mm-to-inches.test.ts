import { describe, expect, it } from '@jest/globals';

import { mmToInches } from './mm-to-inches.js';

describe('mmToInches', () => {
  it('gives exactly 12 in for 304.8 mm', () => {
    // NIST SP 811 App. B.8: 12 in = 304.8 mm; a naive 304.8 / 25.4 gives 12.000000000000002
    expect(mmToInches(304.8)).toBe(12);
  });

  it('gives exactly 14 in for 355.6 mm', () => {
    // NIST SP 811 App. B.8: 14 in = 355.6 mm
    expect(mmToInches(355.6)).toBe(14);
  });

  it('gives 12.795 in for a 325 mm block', () => {
    // hand-worked: 325 / 25.4 = 12.79527559…
    expect(mmToInches(325)).toBeCloseTo(12.795275590551, 11);
  });
});
