/**
 * Rounds to `digits` decimals, halves away from zero (so 2.675 → 2.68 and 0.125 → 0.13).
 * Shifts through the decimal string rather than multiplying, because 1.005 * 100 is
 * 100.49999999999999 in binary and would round the wrong way.
 */
export function roundHalfUp(value: number, digits: number): number {
  if (!Number.isFinite(value)) throw new RangeError(`cannot round ${value}`);
  if (!Number.isInteger(digits) || digits < 0 || digits > 15) {
    throw new RangeError(`digits must be an integer from 0 to 15, got ${digits}`);
  }
  const magnitude = shiftDecimal(Math.round(shiftDecimal(Math.abs(value), digits)), -digits);
  // `|| 0` turns -0 into 0 so that no "-0" is ever printed.
  return (value < 0 ? -magnitude : magnitude) || 0;
}

function shiftDecimal(value: number, places: number): number {
  const [mantissa, exponent = '0'] = String(value).split('e');
  return Number(`${mantissa}e${Number(exponent) + places}`);
}
