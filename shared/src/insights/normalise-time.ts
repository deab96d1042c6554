export interface NormaliseOptions {
  /** Block diameter every time is expressed on. */
  referenceMm?: number;
  /** 2 scales by cross-section area; a league's own data can supply another (fitDiameterExponent). */
  exponent?: number;
}

export const DEFAULT_REFERENCE_MM = 300;
export const DEFAULT_DIAMETER_EXPONENT = 2;

/**
 * A time on a block of `diameterMm` expressed as if cut on the reference block:
 * time × (reference ÷ diameter)^exponent. A bigger block takes longer, so a time on a
 * 350 mm block normalises down and a time on a 250 mm block normalises up. The result is
 * left unrounded (in hundredths) so later statistics do not inherit a rounding step.
 */
export function normaliseTime(hundredths: number, diameterMm: number, options: NormaliseOptions = {}): number {
  const referenceMm = options.referenceMm ?? DEFAULT_REFERENCE_MM;
  const exponent = options.exponent ?? DEFAULT_DIAMETER_EXPONENT;
  if (!(hundredths >= 0)) throw new RangeError(`time must be non-negative, got ${hundredths}`);
  if (!(diameterMm > 0) || !(referenceMm > 0)) throw new RangeError('block diameters must be positive');
  return hundredths * (referenceMm / diameterMm) ** exponent;
}
