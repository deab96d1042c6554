import { DIVISIONS, EXPERIENCE_LEVELS, normaliseEmail } from '@endgrain/shared';

import { DomainError } from '../common/errors/domain-error.js';

/** Trimmed text within bounds, or a field-named error. */
export function text(field: string, label: string, raw: string | null | undefined, min: number, max: number): string {
  const value = (raw ?? '').trim().replace(/\s+/g, ' ');
  if (value.length < min) throw DomainError.badInput(field, min <= 1 ? `${label} is required.` : `${label} must be at least ${min} characters.`);
  if (value.length > max) throw DomainError.badInput(field, `${label} must be at most ${max} characters.`);
  return value;
}

export function isoDate(field: string, label: string, raw: string): string {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(raw ?? '') || Number.isNaN(Date.parse(`${raw}T00:00:00Z`))) {
    throw DomainError.badInput(field, `${label} must be a date written YYYY-MM-DD.`);
  }
  return raw;
}

export function colour(field: string, raw: string | null | undefined, fallback: string): string {
  if (raw == null || raw === '') return fallback;
  if (!/^#[0-9a-fA-F]{6}$/.test(raw)) throw DomainError.badInput(field, 'Colours are written #rrggbb, for example #2f5d3a.');
  return raw.toLowerCase();
}

export function email(field: string, raw: string | null | undefined, { optional = false } = {}): string | null {
  if (optional && (raw == null || raw.trim() === '')) return null;
  const value = normaliseEmail(raw ?? '');
  if (!value) throw DomainError.badInput(field, 'Enter a valid e-mail address.');
  return value;
}

export function divisions(field: string, raw: readonly string[]): ('MENS' | 'WOMENS' | 'MIXED')[] {
  const unique = [...new Set(raw)];
  if (unique.length === 0) throw DomainError.badInput(field, 'Pick at least one division.');
  for (const d of unique) {
    if (!(DIVISIONS as readonly string[]).includes(d)) throw DomainError.badInput(field, `Unknown division "${d}".`);
  }
  return unique as ('MENS' | 'WOMENS' | 'MIXED')[];
}

export function experience(field: string, raw: string): 'ROOKIE' | 'DEVELOPING' | 'EXPERIENCED' {
  if (!(EXPERIENCE_LEVELS as readonly string[]).includes(raw)) throw DomainError.badInput(field, `Unknown experience level "${raw}".`);
  return raw as 'ROOKIE' | 'DEVELOPING' | 'EXPERIENCED';
}
