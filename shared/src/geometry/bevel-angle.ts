/**
 * A symmetric bit has two bevels. The included angle is measured across both faces; the
 * per-side angle is each face against the bit's centre plane: included = 2 × per-side.
 */
export function includedFromPerSide(perSideDeg: number): number {
  assertAngle(perSideDeg, 90, 'per-side');
  return 2 * perSideDeg;
}

/** Per-side angle of a symmetric bevel from its included angle: per-side = included ÷ 2. */
export function perSideFromIncluded(includedDeg: number): number {
  assertAngle(includedDeg, 180, 'included');
  return includedDeg / 2;
}

export function assertAngle(deg: number, below: number, name: string): void {
  if (!(deg >= 0 && deg < below)) throw new RangeError(`${name} angle must be within [0°, ${below}°), got ${deg}`);
}

export function toRadians(deg: number): number {
  return (deg * Math.PI) / 180;
}

export function toDegrees(rad: number): number {
  return (rad * 180) / Math.PI;
}
