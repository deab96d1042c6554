import { toDegrees } from './bevel-angle.js';
import type { ChiselMeasure } from './shoulder-thickness.js';

export interface IncludedAngleInput {
  thicknessMm: number;
  /** Distance from the edge to where the thickness was measured, in the stated direction. */
  distanceMm: number;
  measuredAlong: ChiselMeasure;
}

/**
 * Included angle of a symmetric bevel from a thickness measured a known distance behind
 * the edge: the inverse of shoulderThickness (2·atan(t/2d) straight back, 2·asin(t/2d) along a face).
 */
export function includedAngleFromThickness({ thicknessMm, distanceMm, measuredAlong }: IncludedAngleInput): number {
  if (!(thicknessMm >= 0)) throw new RangeError(`thickness must be non-negative, got ${thicknessMm}`);
  if (!(distanceMm > 0)) throw new RangeError(`distance behind the edge must be positive, got ${distanceMm}`);
  const ratio = thicknessMm / (2 * distanceMm);
  if (measuredAlong === 'back-from-edge') return toDegrees(2 * Math.atan(ratio));
  if (ratio > 1) throw new RangeError('a face shorter than half the thickness is impossible');
  return toDegrees(2 * Math.asin(ratio));
}
