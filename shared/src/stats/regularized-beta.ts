import { gammaln } from 'simple-statistics';

const EPSILON = 1e-16;
const MAX_ITERATIONS = 10_000;

/**
 * Regularised incomplete beta I_x(a, b), by the continued fraction (modified Lentz),
 * applied to whichever of x and 1 − x makes it converge fast.
 */
export function regularizedBeta(x: number, a: number, b: number): number {
  if (!(a > 0 && b > 0)) throw new RangeError(`beta shapes must be positive, got ${a}, ${b}`);
  if (!(x >= 0 && x <= 1)) throw new RangeError(`beta argument must be within [0, 1], got ${x}`);
  if (x === 0 || x === 1) return x;
  const logFront = gammaln(a + b) - gammaln(a) - gammaln(b) + a * Math.log(x) + b * Math.log1p(-x);
  if (x < (a + 1) / (a + b + 2)) return (Math.exp(logFront) * continuedFraction(x, a, b)) / a;
  return 1 - (Math.exp(logFront) * continuedFraction(1 - x, b, a)) / b;
}

function continuedFraction(x: number, a: number, b: number): number {
  const tiny = 1e-300;
  let c = 1;
  let d = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(d) < tiny) d = tiny;
  d = 1 / d;
  let h = d;
  for (let m = 1; m < MAX_ITERATIONS; m++) {
    const m2 = 2 * m;
    // Even step, then odd step, of the fraction's two-term recurrence.
    for (const numerator of [
      (m * (b - m) * x) / ((a + m2 - 1) * (a + m2)),
      (-(a + m) * (a + b + m) * x) / ((a + m2) * (a + m2 + 1)),
    ]) {
      d = 1 + numerator * d;
      if (Math.abs(d) < tiny) d = tiny;
      c = 1 + numerator / c;
      if (Math.abs(c) < tiny) c = tiny;
      d = 1 / d;
      h *= d * c;
    }
    if (Math.abs(d * c - 1) < EPSILON) break;
  }
  return h;
}
