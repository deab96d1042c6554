import { unitFactors } from './unit-factors.js';

/** Inches to millimetres, 1 in = 25.4 mm exactly. */
export function inchesToMm(inches: number): number {
  return (inches * unitFactors.mmPerInchNumerator) / unitFactors.mmPerInchDenominator;
}
