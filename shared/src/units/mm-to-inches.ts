import { unitFactors } from './unit-factors.js';

/** Millimetres to inches, 1 in = 25.4 mm exactly. */
export function mmToInches(mm: number): number {
  return (mm * unitFactors.mmPerInchDenominator) / unitFactors.mmPerInchNumerator;
}
