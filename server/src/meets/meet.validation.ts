import { speciesById } from '@endgrain/shared';

import { DomainError } from '../common/errors/domain-error.js';

export function pointsTable(field: string, raw: number[] | null | undefined, required: boolean): number[] | null {
  if (raw == null || raw.length === 0) {
    if (required) throw DomainError.badInput(field, 'A fixed table needs its place points, for example 7, 6, 5, 4, 3, 2, 1.');
    return null;
  }
  if (raw.length > 50) throw DomainError.badInput(field, 'A points table has at most 50 places.');
  raw.forEach((p, i) => {
    if (!Number.isFinite(p) || p < 0) throw DomainError.badInput(field, `Place ${i + 1}: points must be zero or more.`);
    if (i > 0 && p > raw[i - 1]!) throw DomainError.badInput(field, `Place ${i + 1} cannot earn more points than place ${i}.`);
  });
  return raw;
}

export function species(field: string, raw: string | null | undefined): string | null {
  if (raw == null || raw === '') return null;
  if (!speciesById(raw)) throw DomainError.badInput(field, `Unknown species "${raw}"; pick one from the species list.`);
  return raw;
}

export function diameterMm(field: string, raw: number | null | undefined): number | null {
  if (raw == null) return null;
  if (!Number.isFinite(raw) || raw < 50 || raw > 1500) {
    throw DomainError.badInput(field, 'Block diameter must be between 50 mm (2 in) and 1500 mm (59 in).');
  }
  return Math.round(raw * 10) / 10;
}

export function positiveInt(field: string, label: string, raw: number | null | undefined, max: number): number | null {
  if (raw == null) return null;
  if (!Number.isInteger(raw) || raw < 1 || raw > max) throw DomainError.badInput(field, `${label} must be a whole number from 1 to ${max}.`);
  return raw;
}

export function weight(field: string, raw: number): number {
  if (!Number.isFinite(raw) || raw <= 0 || raw > 10) throw DomainError.badInput(field, 'Event weight must be more than 0 and at most 10 (for example 1.5).');
  return Math.round(raw * 100) / 100;
}
