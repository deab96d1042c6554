import { z } from 'zod';

import { DIVISIONS, type Division } from '../league/divisions.js';
import { BLOCK_CONDITIONS, type BlockCondition } from './block-conditions.js';
import { athletes, choice, length, number, optionalText, requiredText, species, watchTimes } from './cell-readers.js';
import { HEAD_GRINDS, type HeadGrind } from './head-grinds.js';
import type { PostedStatus } from './posted-statuses.js';
import { SHEET_COLUMNS, type SheetColumnKey } from './sheet-columns.js';
import { sheetError, type SheetError } from './sheet-error.js';
import type { SheetRow } from './sheet-row.js';

const spell = <T extends string>(values: readonly T[], extra: Record<string, T> = {}): Record<string, T> => ({
  ...Object.fromEntries(values.map((value) => [value.toLowerCase().replace(/_/g, ''), value])),
  ...extra,
});

const DIVISION_SPELLINGS = spell<Division>(DIVISIONS, { men: 'MENS', women: 'WOMENS', m: 'MENS', w: 'WOMENS', x: 'MIXED' });
const STATUS_SPELLINGS: Record<string, PostedStatus> = {
  finished: 'FINISHED', ok: 'FINISHED', scratch: 'SCRATCH', notime: 'SCRATCH', nt: 'SCRATCH', dns: 'SCRATCH',
  didnotfinish: 'DID_NOT_FINISH', dnf: 'DID_NOT_FINISH', disqualified: 'DISQUALIFIED', dq: 'DISQUALIFIED',
};
const CONDITION_SPELLINGS = spell<BlockCondition>(BLOCK_CONDITIONS, { wet: 'GREEN', greenwet: 'GREEN' });
const GRIND_SPELLINGS = spell<HeadGrind>(HEAD_GRINDS);

const rowSchema = z.object({
  event: requiredText('the event', 80),
  division: choice(DIVISION_SPELLINGS, "Men's, Women's or Mixed", true),
  club: requiredText('the club', 120),
  athletes,
  time: watchTimes,
  time2: watchTimes,
  time3: watchTimes,
  score: number({ min: 0, max: 100000, unit: /^$/, what: 'a score (a number)' }),
  penalty: number({ min: 0, max: 3600, unit: /^(s|sec|secs|seconds?)?$/i, what: 'penalty seconds (a number)' }),
  status: choice(STATUS_SPELLINGS, 'finished, scratch, did not finish or disqualified', false),
  reason: optionalText(200),
  axeLabel: optionalText(40),
  grind: choice(GRIND_SPELLINGS, 'flat, convex, chisel or compound', false),
  bevelAngle: number({ min: 5, max: 90, unit: /^(°|deg|degrees?)?$/i, what: 'an angle in degrees' }),
  chiselWidth: length({ min: 0, max: 60 }),
  species,
  diameter: length({ min: 50, max: 1500 }),
  condition: choice(CONDITION_SPELLINGS, 'green (wet), seasoned, dry, punky, frozen or knotty', false),
});

const NAMES = new Map(SHEET_COLUMNS.map((column) => [column.key, column.name]));

export type ReadSheetRow = { ok: true; value: SheetRow } | { ok: false; errors: SheetError[] };

/**
 * Validates one data row (cells keyed by column; missing columns read as empty). Every cell
 * is checked and every problem reported, so one upload lists all of a sheet's mistakes.
 */
export function readSheetRow(row: number, cells: Partial<Record<SheetColumnKey, string>>): ReadSheetRow {
  const input = Object.fromEntries(SHEET_COLUMNS.map((column) => [column.key, cells[column.key] ?? '']));
  const parsed = rowSchema.safeParse(input);
  if (!parsed.success) {
    return {
      ok: false,
      errors: parsed.error.issues.map((issue) => {
        const key = String(issue.path[0]) as SheetColumnKey;
        return sheetError(row, NAMES.get(key) ?? key, issue.message);
      }),
    };
  }
  const v = parsed.data;
  const rawTimes = [...v.time, ...v.time2, ...v.time3];
  const errors: SheetError[] = [];
  if (rawTimes.length > 3) errors.push(sheetError(row, 'time', `${rawTimes.length} watch times given; Endgrain takes one to three`));
  const status = v.status ?? 'FINISHED';
  if (status === 'DISQUALIFIED' && !v.reason) errors.push(sheetError(row, 'reason', 'a disqualification needs a reason'));
  if (status !== 'DISQUALIFIED' && v.reason) errors.push(sheetError(row, 'reason', 'a reason is kept for disqualifications only'));
  if (v.status === null && rawTimes.length === 0 && v.score === null) {
    errors.push(sheetError(row, 'status', 'no time, no score and no status; give one (scratch when the athlete did not run)'));
  }
  if (errors.length) return { ok: false, errors };
  return {
    ok: true,
    value: {
      row,
      event: v.event,
      division: v.division!,
      club: v.club,
      athletes: v.athletes,
      rawTimes,
      score: v.score,
      penaltySeconds: v.penalty ?? 0,
      status,
      reason: v.reason,
      axeLabel: v.axeLabel,
      grind: v.grind,
      bevelIncludedDeg: v.bevelAngle,
      chiselWidthMm: v.chiselWidth,
      speciesId: v.species,
      diameterMm: v.diameter,
      condition: v.condition,
    },
  };
}

