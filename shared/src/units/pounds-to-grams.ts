import { unitFactors } from './unit-factors.js';

/** Pounds (avoirdupois) to grams, 1 lb = 453.59237 g exactly. */
export function poundsToGrams(pounds: number): number {
  return (pounds * unitFactors.gramsPerPoundNumerator) / unitFactors.gramsPerPoundDenominator;
}
