import { describe, expect, it } from '@jest/globals';

import { leastSquaresSlope } from './least-squares-slope.js';

describe('leastSquaresSlope', () => {
  it('fits a small hand-worked set with its standard error', () => {
    // Hand-worked: x = 1..5, y = 1, 3, 2, 5, 4. x̄ = ȳ = 3; Sxx = 10; Sxy = 4 + 0 + 0 + 2 + 2 = 8.
    // b = 0.8, a = 3 − 2.4 = 0.6; residuals −0.4, 0.8, −1.0, 1.2, −0.6 → RSS = 3.6;
    // s² = 3.6/3 = 1.2; SE(b) = √(1.2/10) = 0.3464102.
    const fit = leastSquaresSlope([1, 3, 2, 5, 4].map((y, i) => ({ x: i + 1, y })));
    expect(fit.slope).toBeCloseTo(0.8, 12);
    expect(fit.intercept).toBeCloseTo(0.6, 12);
    expect(fit.standardError).toBeCloseTo(0.3464102, 7);
    expect(fit.df).toBe(3);
  });

  it('has zero standard error on an exact line', () => {
    // Identity: y = 2 − 1.5x has no residuals.
    const fit = leastSquaresSlope([0, 1, 2, 3].map((x) => ({ x, y: 2 - 1.5 * x })));
    expect(fit.slope).toBeCloseTo(-1.5, 12);
    expect(fit.standardError).toBeCloseTo(0, 12);
  });

  it('spends degrees of freedom absorbed before the fit', () => {
    // Hand-worked: same five points with 1 absorbed parameter → df = 5 − 2 − 1 = 2,
    // SE = √(3.6/2/10) = 0.4242641.
    const fit = leastSquaresSlope([1, 3, 2, 5, 4].map((y, i) => ({ x: i + 1, y })), { absorbedParameters: 1 });
    expect(fit.df).toBe(2);
    expect(fit.standardError).toBeCloseTo(0.4242641, 7);
  });

  it('refuses data with no spread in x', () => {
    expect(() => leastSquaresSlope([{ x: 1, y: 1 }, { x: 1, y: 2 }, { x: 1, y: 3 }])).toThrow(RangeError);
  });
});
