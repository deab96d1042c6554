import { describe, expect, it } from '@jest/globals';

import { percentOfBest } from './percent-of-best.js';

// percentage scoring used by a northeastern spring meet: the winner earns 100; the formula is not
// published, 100 × best ÷ own (timed) and 100 × own ÷ best (scored) is our stated choice
describe('percentOfBest', () => {
  it('gives a timed winner 100 and the rest best ÷ own', () => {
    // hand-worked: 100 × 40.00 ÷ 40.00 = 100; 100 × 40.00 ÷ 50.00 = 80
    expect(percentOfBest('timed', 4000, 4000)).toBe(100);
    expect(percentOfBest('timed', 5000, 4000)).toBe(80);
  });

  it('gives a scored event own ÷ best', () => {
    // hand-worked: axe-throw totals 15 against a best of 20 → 100 × 15 ÷ 20 = 75
    expect(percentOfBest('scored', 15, 20)).toBe(75);
  });

  it('gives nothing in a scored event where nobody scored', () => {
    // our rule: 100 × 0 ÷ 0 is undefined; with no best score there is no share to hand out
    expect(percentOfBest('scored', 0, 0)).toBe(0);
  });

  it('gives a fewest-hits event best ÷ own hits', () => {
    // hand-worked: 100 × 10 ÷ 12 = 83.333…
    expect(percentOfBest('fewest-hits', 12, 10)).toBeCloseTo(83.3333333, 6);
    // our rule: a best of 0 hits earns 100 itself, and 100 × 0 ÷ own = 0 for the rest
    expect(percentOfBest('fewest-hits', 0, 0)).toBe(100);
    expect(percentOfBest('fewest-hits', 3, 0)).toBe(0);
  });
});
