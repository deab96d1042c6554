import { z } from 'zod';

import { parseTime } from '../time/parse-time.js';
import { parseLength } from '../units/parse-length.js';
import { listSpecies } from '../species/list-species.js';
import { choiceKey } from './read-choice.js';

interface Ctx {
  addIssue(issue: { code: 'custom'; message: string }): void;
}

/** Adds the problem to the row's issues and returns zod's "no value" marker. */
function fail(ctx: Ctx, message: string): never {
  ctx.addIssue({ code: 'custom', message });
  return z.NEVER;
}

const text = z.string().transform((value) => value.trim());

export const requiredText = (what: string, max: number) =>
  text.transform((value, ctx) => {
    if (value === '') return fail(ctx, `${what} is empty`);
    if (value.length > max) return fail(ctx, `${what} is longer than ${max} characters`);
    return value;
  });

export const optionalText = (max: number) =>
  text.transform((value, ctx) => {
    if (value.length > max) return fail(ctx, `is longer than ${max} characters`);
    return value === '' ? null : value;
  });

export const choice = <T extends string>(spellings: Readonly<Record<string, T>>, list: string, required: boolean) =>
  text.transform((value, ctx): T | null => {
    if (value === '') return required ? fail(ctx, `is empty; use ${list}`) : null;
    return spellings[choiceKey(value)] ?? fail(ctx, `"${value}" is not one of ${list}`);
  });

/** One to three watch times in one cell, split by "/" or ";". */
export const watchTimes = text.transform((value, ctx): number[] => {
  if (value === '') return [];
  const parts = value.split(/[/;]/).map((part) => part.trim());
  if (parts.length > 3) return fail(ctx, `"${value}" holds more than three watch times`);
  const times: number[] = [];
  for (const part of parts) {
    const parsed = parseTime(part);
    if (!parsed.ok) return fail(ctx, parts.length === 1 ? parsed.message : `${parsed.message} (in "${value}")`);
    if (parsed.hundredths === 0) return fail(ctx, `"${part}" is no time at all; leave it empty or record a scratch`);
    times.push(parsed.hundredths);
  }
  return times;
});

export const number = (options: { min: number; max: number; unit: RegExp; what: string; integer?: boolean }) =>
  text.transform((value, ctx): number | null => {
    if (value === '') return null;
    const match = /^(?<amount>\d+(?:\.\d+)?|\.\d+)\s*(?<unit>.*)$/u.exec(value)?.groups;
    const amount = Number(match?.['amount']);
    if (!match || !options.unit.test(match['unit'] ?? '')) return fail(ctx, `"${value}" is not ${options.what}`);
    if (options.integer && !Number.isInteger(amount)) return fail(ctx, `"${value}" is not a whole number`);
    if (amount < options.min || amount > options.max) return fail(ctx, `"${value}" is outside ${options.min}–${options.max}`);
    return amount;
  });

export const length = (options: { min: number; max: number }) =>
  text.transform((value, ctx): number | null => {
    if (value === '') return null;
    const parsed = parseLength(value);
    if (!parsed.ok) return fail(ctx, parsed.message);
    if (parsed.mm < options.min || parsed.mm > options.max) return fail(ctx, `"${value}" is outside ${options.min}–${options.max} mm`);
    return parsed.mm;
  });

const SPECIES = new Map(listSpecies().flatMap((s) => [[choiceKey(s.id), s.id], [choiceKey(s.commonName), s.id]] as const));

export const species = text.transform((value, ctx): string | null => {
  if (value === '') return null;
  return SPECIES.get(choiceKey(value)) ?? fail(ctx, `"${value}" is not a species in Endgrain's table`);
});

export const athletes = text.transform((value, ctx): string[] => {
  if (value === '') return fail(ctx, 'no athlete named');
  const names = value.split('&').map((name) => name.trim().replace(/\s+/g, ' '));
  if (names.some((name) => name === '')) return fail(ctx, `"${value}" has an empty name; join names with " & "`);
  return names;
});
