import { assertAngle, toRadians } from './bevel-angle.js';

/**
 * How a chisel (bevel) width was measured on a symmetric bevel:
 * - `back-from-edge`: straight back from the edge along the bit's centre line, as a rule laid
 *   across the cheek reads it: t = 2 · w · tan(included ÷ 2);
 * - `along-face`: the slant length of one bevel face: t = 2 · w · sin(included ÷ 2).
 */
export type ChiselMeasure = 'back-from-edge' | 'along-face';

export interface ShoulderThicknessInput {
  includedDeg: number;
  chiselWidthMm: number;
  measuredAlong: ChiselMeasure;
}

/**
 * Thickness of the bit at the chisel's shoulder (where the bevel meets the cheek), taking
 * the edge itself as a sharp line of zero thickness.
 */
export function shoulderThickness({ includedDeg, chiselWidthMm, measuredAlong }: ShoulderThicknessInput): number {
  assertAngle(includedDeg, 180, 'included');
  if (!(chiselWidthMm >= 0)) throw new RangeError(`chisel width must be non-negative, got ${chiselWidthMm}`);
  const half = toRadians(includedDeg) / 2;
  const perSide = measuredAlong === 'back-from-edge' ? Math.tan(half) : Math.sin(half);
  return 2 * chiselWidthMm * perSide;
}
