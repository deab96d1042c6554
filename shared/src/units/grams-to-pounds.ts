import { unitFactors } from './unit-factors.js';

/** Grams to pounds (avoirdupois), 1 lb = 453.59237 g exactly. */
export function gramsToPounds(grams: number): number {
  return (grams * unitFactors.gramsPerPoundDenominator) / unitFactors.gramsPerPoundNumerator;
}
