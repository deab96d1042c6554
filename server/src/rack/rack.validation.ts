import { formatLength, formatMass } from '@endgrain/shared';

import { DomainError } from '../common/errors/domain-error.js';

interface Range {
  min: number;
  max: number;
}

// Sanity bounds, not rules of the sport: wide enough for hatchets, throwing axes and racing
// heads, narrow enough to catch inches typed into a millimetre box (common practice).
export const HEAD_WEIGHT_G: Range = { min: 200, max: 5000 };
export const BIT_WIDTH_MM: Range = { min: 20, max: 300 };
export const BEVEL_INCLUDED_DEG: Range = { min: 5, max: 60 };
export const CHISEL_WIDTH_MM: Range = { min: 0.5, max: 60 };
export const HANDLE_LENGTH_MM: Range = { min: 150, max: 1500 };

const both = (mm: number): string => `${formatLength(mm, 'metric')} (${formatLength(mm, 'imperial')})`;

/** A length in millimetres within bounds; the message prints both unit systems. */
export function lengthMm(field: string, label: string, raw: number | null | undefined, range: Range): number | null {
  if (raw == null) return null;
  if (!Number.isFinite(raw) || raw < range.min || raw > range.max) {
    throw DomainError.badInput(field, `${label} must be between ${both(range.min)} and ${both(range.max)}.`);
  }
  return Math.round(raw * 100) / 100;
}

export function massG(field: string, label: string, raw: number | null | undefined, range: Range): number | null {
  if (raw == null) return null;
  if (!Number.isFinite(raw) || raw < range.min || raw > range.max) {
    const show = (g: number) => `${formatMass(g, 'metric')} (${formatMass(g, 'imperial')})`;
    throw DomainError.badInput(field, `${label} must be between ${show(range.min)} and ${show(range.max)}.`);
  }
  return Math.round(raw);
}

export function includedAngle(field: string, raw: number | null | undefined): number | null {
  if (raw == null) return null;
  const { min, max } = BEVEL_INCLUDED_DEG;
  if (!Number.isFinite(raw) || raw < min || raw > max) {
    throw DomainError.badInput(field, `Bevel (included angle, across both faces) must be between ${min}° and ${max}°; a per-side angle is half of it.`);
  }
  return Math.round(raw * 100) / 100;
}

/** Trimmed text of at most `max` characters; empty is allowed. */
export function optionalText(field: string, label: string, raw: string | null | undefined, max: number): string {
  const value = (raw ?? '').trim();
  if (value.length > max) throw DomainError.badInput(field, `${label} must be at most ${max} characters.`);
  return value;
}
