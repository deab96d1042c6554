import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import { chiSquareSurvival } from './chi-square-survival.js';
import { normalCdf } from './normal-cdf.js';
import { regularizedBeta } from './regularized-beta.js';
import { regularizedGammaP, regularizedGammaQ } from './regularized-gamma.js';
import { studentTCdf } from './student-t-cdf.js';
import { studentTQuantile } from './student-t-quantile.js';

describe('regularised incomplete gamma', () => {
  it('reduces to 1 − e^(−x) for shape 1', () => {
    // Identity: P(1, x) = 1 − e^(−x), so Q(1, x) = e^(−x).
    for (const x of [0.1, 1, 2.5, 10, 40]) expect(regularizedGammaQ(1, x)).toBeCloseTo(Math.exp(-x), 14);
  });

  it('matches the Poisson sum for whole-number shapes on both sides of the series/fraction split', () => {
    // Identity: Q(n, x) = e^(−x) Σ_{k<n} x^k/k!; for n = 4, x = 3 uses the series (x < a + 1) and x = 9
    // the continued fraction. Hand-worked: Q(4, 3) = e^(−3)(1 + 3 + 4.5 + 4.5) = 13e^(−3) = 0.6472319.
    const poisson = (n: number, x: number) => {
      let term = 1;
      let sum = 0;
      for (let k = 0; k < n; k++) {
        sum += term;
        term *= x / (k + 1);
      }
      return Math.exp(-x) * sum;
    };
    expect(regularizedGammaQ(4, 3)).toBeCloseTo(13 * Math.exp(-3), 14);
    for (const x of [0.5, 3, 9, 25]) {
      expect(regularizedGammaQ(4, x)).toBeCloseTo(poisson(4, x), 13);
      expect(regularizedGammaP(4, x)).toBeCloseTo(1 - poisson(4, x), 13);
    }
  });
});

describe('normal and chi-square tails', () => {
  it('gives the textbook two-sided 5 % point of the normal', () => {
    // Standard normal table: Φ(1.959963985) = 0.975.
    expect(normalCdf(1.959963985)).toBeCloseTo(0.975, 9);
    expect(normalCdf(-1.959963985)).toBeCloseTo(0.025, 9);
  });

  it('equals e^(−x/2) with two degrees of freedom', () => {
    // Identity: the chi-square with 2 df is exponential with mean 2.
    for (const x of [0.5, 0.771429, 6, 30]) expect(chiSquareSurvival(x, 2)).toBeCloseTo(Math.exp(-x / 2), 14);
  });

  it('gives the textbook 5 % point with one degree of freedom', () => {
    // Chi-square table: χ²(0.95, 1) = 3.841459 (= 1.959964²).
    expect(chiSquareSurvival(3.841458821, 1)).toBeCloseTo(0.05, 9);
  });
});

describe('regularised incomplete beta', () => {
  it('meets its closed forms', () => {
    // Identities: I_x(1, 1) = x; I_x(a, 1) = x^a; I_x(1, b) = 1 − (1 − x)^b; I_½(a, a) = ½.
    expect(regularizedBeta(0.3, 1, 1)).toBeCloseTo(0.3, 14);
    expect(regularizedBeta(0.7, 3, 1)).toBeCloseTo(0.343, 14);
    expect(regularizedBeta(0.2, 1, 4)).toBeCloseTo(1 - 0.8 ** 4, 14);
    expect(regularizedBeta(0.5, 7.5, 7.5)).toBeCloseTo(0.5, 14);
  });

  it('is symmetric: I_x(a, b) = 1 − I_(1−x)(b, a)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        fc.double({ min: 0.2, max: 40, noNaN: true }),
        fc.double({ min: 0.2, max: 40, noNaN: true }),
        (x, a, b) => Math.abs(regularizedBeta(x, a, b) - (1 - regularizedBeta(1 - x, b, a))) < 1e-12,
      ),
    );
  });
});

describe('Student t', () => {
  it('matches the closed forms for one and two degrees of freedom', () => {
    // Identities: df = 1 is the Cauchy, t = tan(π(p − ½)); df = 2 has t = (2p − 1)/√(2p(1 − p)).
    for (const p of [0.6, 0.9, 0.975, 0.999]) {
      expect(studentTQuantile(p, 1)).toBeCloseTo(Math.tan(Math.PI * (p - 0.5)), 9);
      expect(studentTQuantile(p, 2)).toBeCloseTo((2 * p - 1) / Math.sqrt(2 * p * (1 - p)), 11);
    }
  });

  it('gives t(0.975, 9) behind the sleep-data interval', () => {
    // Student (1908) sleep differences, 95 % CI (0.7001142, 2.4598858) around mean 1.58 with
    // s = 1.2299955, n = 10 → t = (2.4598858 − 1.58)/(1.2299955/√10) = 2.262157 (hand-worked).
    expect(studentTQuantile(0.975, 9)).toBeCloseTo(2.262157, 5);
  });

  it('round-trips through its distribution function', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.001, max: 0.999, noNaN: true }),
        fc.integer({ min: 1, max: 200 }),
        (p, df) => Math.abs(studentTCdf(studentTQuantile(p, df), df) - p) < 1e-10,
      ),
    );
  });

  it('approaches the normal for many degrees of freedom', () => {
    // Standard normal table: z(0.975) = 1.959964; t(0.975, 10⁶) differs by about 1e-6.
    expect(studentTQuantile(0.975, 1e6)).toBeCloseTo(1.959964, 5);
  });
});
