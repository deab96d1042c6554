import { regularizedGammaQ } from './regularized-gamma.js';

/**
 * Standard normal distribution function Φ(z), through erfc(u) = Q(½, u²); the tail is
 * computed directly so small p-values keep their digits.
 */
export function normalCdf(z: number): number {
  if (Number.isNaN(z)) return Number.NaN;
  if (z === 0) return 0.5;
  const tail = 0.5 * regularizedGammaQ(0.5, (z * z) / 2);
  return z < 0 ? tail : 1 - tail;
}
