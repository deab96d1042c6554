import { regularizedGammaQ } from './regularized-gamma.js';

/** P(X ≥ x) for a chi-square variable with `df` degrees of freedom: Q(df/2, x/2). */
export function chiSquareSurvival(x: number, df: number): number {
  if (!(df > 0)) throw new RangeError(`degrees of freedom must be positive, got ${df}`);
  if (x <= 0) return 1;
  return regularizedGammaQ(df / 2, x / 2);
}
