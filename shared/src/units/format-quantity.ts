import { roundHalfUp } from './round-half-up.js';

/**
 * "value unit" with at most `digits` decimals and trailing zeros dropped ("12 in", "304.8 mm"):
 * a dimension typed as 12 inches reads back as 12, not 12.00.
 */
export function formatQuantity(value: number, digits: number, unit: string): string {
  const fixed = roundHalfUp(value, digits).toFixed(digits);
  const trimmed = fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
  return `${trimmed} ${unit}`;
}
