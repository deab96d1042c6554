import { studentTQuantile } from './student-t-quantile.js';

export interface Point {
  x: number;
  y: number;
}

export interface SlopeFit {
  slope: number;
  intercept: number;
  /** Standard error of the slope: √(RSS / df / Sxx). */
  standardError: number;
  n: number;
  /** Residual degrees of freedom: n − 2 − absorbedParameters. */
  df: number;
  low: number;
  high: number;
  level: number;
}

export interface SlopeOptions {
  /**
   * Parameters already fitted before the call and not counted by this fit: demeaning the
   * data within G groups absorbs G − 1 of them beyond the intercept fitted here.
   */
  absorbedParameters?: number;
  level?: number;
}

/** Ordinary least-squares line y = a + b·x, computed from centred sums (two passes). */
export function leastSquaresSlope(points: readonly Point[], options: SlopeOptions = {}): SlopeFit {
  const level = options.level ?? 0.95;
  const n = points.length;
  const df = n - 2 - (options.absorbedParameters ?? 0);
  if (df < 1) throw new RangeError(`a slope with a standard error needs more points (df = ${df})`);
  const meanX = points.reduce((s, p) => s + p.x, 0) / n;
  const meanY = points.reduce((s, p) => s + p.y, 0) / n;
  let sxx = 0;
  let sxy = 0;
  for (const p of points) {
    sxx += (p.x - meanX) ** 2;
    sxy += (p.x - meanX) * (p.y - meanY);
  }
  if (sxx === 0) throw new RangeError('all x values are equal: the slope is undefined');
  const slope = sxy / sxx;
  const intercept = meanY - slope * meanX;
  const rss = points.reduce((s, p) => s + (p.y - intercept - slope * p.x) ** 2, 0);
  const standardError = Math.sqrt(rss / df / sxx);
  const half = studentTQuantile((1 + level) / 2, df) * standardError;
  return { slope, intercept, standardError, n, df, low: slope - half, high: slope + half, level };
}
