/**
 * Exact factors of the international yard and pound (1959).
 * Kept as integer ratios so that conversions multiply and divide by integers: 25.4 and
 * 0.45359237 are not exact in binary, 254/10 and 45359237/100000 give correctly rounded results.
 */
export const unitFactors = {
  /** 1 in = 254/10 mm = 25.4 mm exactly. */
  mmPerInchNumerator: 254,
  mmPerInchDenominator: 10,
  /** 1 lb = 45359237/100000 g = 453.59237 g exactly. */
  gramsPerPoundNumerator: 45_359_237,
  gramsPerPoundDenominator: 100_000,
} as const;
