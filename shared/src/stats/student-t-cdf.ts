import { regularizedBeta } from './regularized-beta.js';

/** P(T ≤ t) for Student's t with `df` degrees of freedom, via I_{df/(df+t²)}(df/2, ½). */
export function studentTCdf(t: number, df: number): number {
  if (!(df > 0)) throw new RangeError(`degrees of freedom must be positive, got ${df}`);
  if (t === 0) return 0.5;
  if (t === Infinity) return 1;
  if (t === -Infinity) return 0;
  const tail = 0.5 * regularizedBeta(df / (df + t * t), df / 2, 0.5);
  return t > 0 ? 1 - tail : tail;
}
