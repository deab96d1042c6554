import { formatLength, formatMass, gramsToPounds, inchesToMm, mmToInches, poundsToGrams } from '@endgrain/shared';

import type { UnitPreference } from '../api/types.js';

/** The unit words a form shows for each kind of value. */
export function unitWords(units: UnitPreference) {
  return units === 'IMPERIAL' ? { length: 'in', mass: 'lb' } : { length: 'mm', mass: 'kg' };
}

const system = (units: UnitPreference) => (units === 'IMPERIAL' ? 'imperial' : 'metric');

/** "19.05 mm" or "0.75 in"; a dash for a value not recorded. */
export function showLength(mm: number | null, units: UnitPreference, digits?: number): string {
  return mm === null ? '—' : formatLength(mm, system(units), digits === undefined ? {} : { digits });
}

/** Head weights are spoken of in kilograms or pounds: "2.5 kg", "5.5 lb". */
export function showMass(grams: number | null, units: UnitPreference): string {
  return grams === null ? '—' : formatMass(grams, system(units));
}

/** "15° included · 7.5° per side": both angles, always labelled. */
export function showBevel(includedDeg: number | null, perSideDeg: number | null): string {
  if (includedDeg === null || perSideDeg === null) return '—';
  return `${trim(includedDeg)}° included · ${trim(perSideDeg)}° per side`;
}

const trim = (value: number) => String(Math.round(value * 100) / 100);

/**
 * A typed number, with inch fractions allowed ("3/4", "1 1/4") because chisels are spoken of that
 * way. Null for an empty box, NaN for something that is not a number.
 */
export function readNumber(text: string): number | null {
  const value = text.trim().replace(',', '.');
  if (value === '') return null;
  const fraction = /^(?:(\d+)\s+)?(\d+)\/(\d+)$/.exec(value);
  if (fraction) return Number(fraction[1] ?? 0) + Number(fraction[2]) / Number(fraction[3]);
  return /^\d+(?:\.\d+)?$|^\.\d+$/.test(value) ? Number(value) : Number.NaN;
}

/** A typed length in the form's units, in millimetres. */
export function lengthToMm(value: number | null, units: UnitPreference): number | null {
  if (value === null) return null;
  return units === 'IMPERIAL' ? inchesToMm(value) : value;
}

/** A typed head weight (kg or lb) in grams. */
export function massToGrams(value: number | null, units: UnitPreference): number | null {
  if (value === null) return null;
  return Math.round(units === 'IMPERIAL' ? poundsToGrams(value) : value * 1000);
}

/** A stored length as the form shows it (no unit: the unit sits beside the box). */
export function lengthForForm(mm: number | null, units: UnitPreference): string {
  if (mm === null) return '';
  return trimTo(units === 'IMPERIAL' ? mmToInches(mm) : mm, units === 'IMPERIAL' ? 3 : 2);
}

export function massForForm(grams: number | null, units: UnitPreference): string {
  if (grams === null) return '';
  return trimTo(units === 'IMPERIAL' ? gramsToPounds(grams) : grams / 1000, 3);
}

const trimTo = (value: number, digits: number) => String(Number(value.toFixed(digits)));
