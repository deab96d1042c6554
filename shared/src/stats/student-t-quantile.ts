import { regularizedBeta } from './regularized-beta.js';

/**
 * Inverse of Student's t distribution function: the t with P(T ≤ t) = p. Solves
 * I_x(df/2, ½) = 2·min(p, 1 − p) for x by bisection (the beta function rises with x, so
 * bisection cannot go wrong) and maps back with t = √(df (1 − x) / x).
 */
export function studentTQuantile(p: number, df: number): number {
  if (!(df > 0)) throw new RangeError(`degrees of freedom must be positive, got ${df}`);
  if (!(p >= 0 && p <= 1)) throw new RangeError(`probability must be within [0, 1], got ${p}`);
  if (p === 0) return -Infinity;
  if (p === 1) return Infinity;
  if (p === 0.5) return 0;
  const target = 2 * Math.min(p, 1 - p);
  let low = 0;
  let high = 1;
  // Stop on relative width so far tails (x near 0) keep their precision too.
  for (let i = 0; i < 2000 && high - low > 1e-17 * high; i++) {
    const middle = (low + high) / 2;
    if (middle === low || middle === high) break;
    if (regularizedBeta(middle, df / 2, 0.5) < target) low = middle;
    else high = middle;
  }
  const x = (low + high) / 2;
  const t = Math.sqrt((df * (1 - x)) / x);
  return p > 0.5 ? t : -t;
}
