import { describe, expect, it } from '@jest/globals';

import { kruskalWallis } from './kruskal-wallis.js';
import { mannWhitney } from './mann-whitney.js';
import { midRanks } from './mid-ranks.js';

// Hollander & Wolfe (1973), Nonparametric Statistical Methods, p. 69.
const HW_X = [0.8, 0.83, 1.89, 1.04, 1.45, 1.38, 1.91, 1.64, 0.73, 1.46];
const HW_Y = [1.15, 0.88, 0.9, 0.74, 1.21];

describe('midRanks', () => {
  it('gives tied values the mean of the ranks they cover', () => {
    // Hand-worked: {5, 3, 3, 9} → 3 and 3 share ranks 1 and 2 → 1.5 each; 5 → 3; 9 → 4.
    expect(midRanks([5, 3, 3, 9])).toEqual({ ranks: [3, 1.5, 1.5, 4], tieSizes: [2] });
  });
});

describe('mannWhitney', () => {
  it('reproduces the Hollander & Wolfe U statistics and exact p-values', () => {
    const result = mannWhitney(HW_X, HW_Y);
    // Hollander & Wolfe 1973 p. 69: U_x = 35, U_y = 15.
    expect(result.uX).toBe(35);
    expect(result.uY).toBe(15);
    expect(result.method).toBe('exact');
    // Same source: exact one-sided p = 382/3003 = 0.1272061; two-sided 0.2544122.
    expect(result.pGreater).toBeCloseTo(382 / 3003, 14);
    expect(result.pTwoSided).toBeCloseTo(0.2544122, 6);
    expect(result.pTwoSided).toBeCloseTo(764 / 3003, 14);
  });

  it('is the mirror image when the samples swap', () => {
    // Symmetry of the test: U_y of (x, y) is U_x of (y, x); the one-sided tails swap.
    const forward = mannWhitney(HW_X, HW_Y);
    const backward = mannWhitney(HW_Y, HW_X);
    expect(backward.uX).toBe(forward.uY);
    expect(backward.pLess).toBeCloseTo(forward.pGreater, 14);
  });

  it('counts every arrangement once in the smallest exact case', () => {
    // Hand-worked: m = n = 1 has two arrangements, U = 0 or 1, each with probability ½.
    const result = mannWhitney([2], [1]);
    expect(result.uX).toBe(1);
    expect(result.pGreater).toBe(0.5);
    expect(result.pLess).toBe(1);
  });

  it('uses the tie-corrected normal approximation when values tie', () => {
    // Hand-worked: x = {1, 2, 2}, y = {2, 3}. Pooled ranks: 1 → 1; the three 2s → 3; 3 → 5.
    // W_x = 1 + 3 + 3 = 7, U_x = 7 − 6 = 1. Ties: one group of 3 → Σ(t³ − t) = 24.
    // Var = (3·2/12)·(6 − 24/(5·4)) = 0.5·4.8 = 2.4. z (lower, +½ continuity) = (1 − 3 + 0.5)/√2.4
    //     = −0.968246; Φ(−0.968246) = 0.166461 (standard normal table).
    const result = mannWhitney([1, 2, 2], [2, 3]);
    expect(result.method).toBe('normal-approximation');
    expect(result.uX).toBe(1);
    expect(result.pLess).toBeCloseTo(0.166461, 5);
    expect(result.pTwoSided).toBeCloseTo(2 * 0.166461, 5);
  });
});

describe('kruskalWallis', () => {
  it('reproduces the Hollander & Wolfe example', () => {
    // Hollander & Wolfe 1973 p. 116: rank sums 36, 36, 33; H = 27/35 = 0.771429; df 2; p 0.679965.
    const result = kruskalWallis([
      [2.9, 3.0, 2.5, 2.6, 3.2],
      [3.8, 2.7, 4.0, 2.4],
      [2.8, 3.4, 3.7, 2.2, 2.0],
    ]);
    expect(result.rankSums).toEqual([36, 36, 33]);
    expect(result.h).toBeCloseTo(27 / 35, 12);
    expect(result.df).toBe(2);
    expect(result.p).toBeCloseTo(0.679965, 6);
    expect(result.tieCorrection).toBe(1);
  });

  it('divides H by the tie correction', () => {
    // Hand-worked: {1, 2}, {2, 3}. Ranks 1, 2.5 | 2.5, 4 → R = 3.5, 6.5; N = 4.
    // Raw H = 12/20·(3.5²/2 + 6.5²/2) − 15 = 0.6·27.25 − 15 = 1.35.
    // C = 1 − (8 − 2)/(64 − 4) = 0.9 → H = 1.5; df 1: p = P(χ²₁ ≥ 1.5) = 2·(1 − Φ(√1.5))
    //   = 2·(1 − Φ(1.224745)) = 0.220671 (standard normal table).
    const result = kruskalWallis([
      [1, 2],
      [2, 3],
    ]);
    expect(result.tieCorrection).toBeCloseTo(0.9, 14);
    expect(result.h).toBeCloseTo(1.5, 12);
    expect(result.p).toBeCloseTo(0.220671, 5);
  });
});
