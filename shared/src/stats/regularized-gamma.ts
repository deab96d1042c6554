import { gammaln } from 'simple-statistics';

const EPSILON = 1e-16;
const MAX_ITERATIONS = 10_000;

/**
 * Upper regularised incomplete gamma Q(a, x) = Γ(a, x) / Γ(a); the lower one is 1 − Q.
 * Series below x = a + 1, Lentz's continued fraction above, the split that keeps both
 * converging quickly.
 */
export function regularizedGammaQ(a: number, x: number): number {
  if (!(a > 0)) throw new RangeError(`gamma shape must be positive, got ${a}`);
  if (!(x >= 0)) throw new RangeError(`gamma argument must be non-negative, got ${x}`);
  if (x === 0) return 1;
  if (x === Infinity) return 0;
  return x < a + 1 ? 1 - lowerSeries(a, x) : upperContinuedFraction(a, x);
}

/** Lower regularised incomplete gamma P(a, x) = 1 − Q(a, x). */
export function regularizedGammaP(a: number, x: number): number {
  if (x > 0 && x < a + 1) return lowerSeries(a, x);
  return 1 - regularizedGammaQ(a, x);
}

function prefactor(a: number, x: number): number {
  return Math.exp(-x + a * Math.log(x) - gammaln(a));
}

function lowerSeries(a: number, x: number): number {
  let term = 1 / a;
  let sum = term;
  for (let n = 1; n < MAX_ITERATIONS; n++) {
    term *= x / (a + n);
    sum += term;
    if (Math.abs(term) < Math.abs(sum) * EPSILON) break;
  }
  return sum * prefactor(a, x);
}

function upperContinuedFraction(a: number, x: number): number {
  const tiny = 1e-300;
  let b = x + 1 - a;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < MAX_ITERATIONS; i++) {
    const an = -i * (i - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < tiny) d = tiny;
    c = b + an / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < EPSILON) break;
  }
  return prefactor(a, x) * h;
}
