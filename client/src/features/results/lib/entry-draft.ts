import { formatTime, inchesToMm, mmToInches, parseLength, parseTime } from '@endgrain/shared';

import type { BlockCondition, HeadGrind, MeetEventResults, PostedStatus, RecordResultInput, Result, UnitPreference } from '../api/types.js';

/** What the results table holds for one entry while it is being typed: text, as typed. */
export interface EntryDraft {
  times: [string, string, string];
  score: string;
  penalty: string;
  status: PostedStatus;
  dqReason: string;
  axeId: string;
  axeLabel: string;
  grind: HeadGrind | '';
  bevel: string;
  chisel: string;
  condition: BlockCondition | '';
}

export type DraftField = keyof Omit<EntryDraft, 'times'> | 'time0' | 'time1' | 'time2';
export type DraftErrors = Partial<Record<DraftField, string>>;

const EMPTY: EntryDraft = {
  times: ['', '', ''], score: '', penalty: '', status: 'FINISHED', dqReason: '', axeId: '', axeLabel: '', grind: '', bevel: '', chisel: '', condition: '',
};

/** The draft of a saved result (times as the watches read), or an empty one for an entry without. */
export function draftFrom(result: Result | undefined, units: UnitPreference): EntryDraft {
  if (!result) return { ...EMPTY, times: ['', '', ''] };
  const times = [0, 1, 2].map((i) => (result.rawTimes[i] === undefined ? '' : formatTime(result.rawTimes[i]!))) as EntryDraft['times'];
  return {
    times,
    score: result.score === null ? '' : String(result.score),
    penalty: result.penaltyHundredths ? String(result.penaltyHundredths / 100) : '',
    status: result.postedStatus,
    dqReason: result.postedStatus === 'DISQUALIFIED' ? (result.reason ?? '') : '',
    axeId: result.axeId ?? '',
    axeLabel: result.axeLabel ?? '',
    grind: result.grind ?? '',
    bevel: result.bevelIncludedDeg === null ? '' : String(result.bevelIncludedDeg),
    chisel: result.chiselWidthMm === null ? '' : chiselText(result.chiselWidthMm, units),
    condition: result.condition ?? '',
  };
}

export function chiselText(mm: number, units: UnitPreference): string {
  return units === 'IMPERIAL' ? String(Math.round(mmToInches(mm) * 1000) / 1000) : String(Math.round(mm * 100) / 100);
}

/** A length typed with its unit ("6 mm", "1/4 in"), or a bare number in the reader's unit. */
function readChisel(text: string, units: UnitPreference): number | string {
  const parsed = parseLength(text);
  if (parsed.ok) return parsed.mm;
  const value = Number(text.replace(',', '.'));
  if (text.trim() === '' || !Number.isFinite(value)) return `“${text}” is not a width; type a number (${units === 'IMPERIAL' ? 'inches' : 'mm'})`;
  return units === 'IMPERIAL' ? inchesToMm(value) : value;
}

const number = (text: string): number | null => {
  const value = Number(text.trim().replace(',', '.'));
  return text.trim() === '' || !Number.isFinite(value) ? null : value;
};

/**
 * Checks a draft before it is sent (the server checks again and has the last word) and builds
 * the mutation's input. Messages name the cell, so each appears beside the field it is about.
 */
export function draftToInput(
  entryId: string,
  draft: EntryDraft,
  event: Pick<MeetEventResults, 'resultKind' | 'usesHead'>,
  units: UnitPreference,
): { ok: true; input: RecordResultInput } | { ok: false; errors: DraftErrors } {
  const errors: DraftErrors = {};
  const times: string[] = [];
  draft.times.forEach((text, i) => {
    if (text.trim() === '') return;
    const parsed = parseTime(text);
    if (!parsed.ok) errors[`time${i}` as DraftField] = parsed.message;
    else times.push(text.trim());
  });
  const finished = draft.status === 'FINISHED';
  if (event.resultKind === 'TIMED' && finished && times.length === 0 && !errors.time0) errors.time0 = 'A finished run needs a time';
  if (draft.status === 'SCRATCH' && times.length > 0) errors.time0 = 'A scratch has no time';
  const score = number(draft.score);
  if (event.resultKind !== 'TIMED') {
    if (draft.score.trim() !== '' && (score === null || score < 0)) errors.score = `“${draft.score}” is not a number`;
    else if (finished && score === null) errors.score = event.resultKind === 'SCORED' ? 'Type the score' : 'Type the hit count';
  }
  const penalty = number(draft.penalty);
  if (draft.penalty.trim() !== '' && (penalty === null || penalty < 0)) errors.penalty = `“${draft.penalty}” is not a number of seconds`;
  if (draft.status === 'DISQUALIFIED' && draft.dqReason.trim() === '') errors.dqReason = 'Say why';
  const bevel = number(draft.bevel);
  if (draft.bevel.trim() !== '' && (bevel === null || bevel < 5 || bevel > 90)) errors.bevel = 'An included angle from 5° to 90°';
  const chisel = draft.chisel.trim() === '' ? null : readChisel(draft.chisel, units);
  if (typeof chisel === 'string') errors.chisel = chisel;
  if (Object.keys(errors).length) return { ok: false, errors };
  return {
    ok: true,
    input: {
      entryId,
      status: draft.status,
      times,
      score: event.resultKind === 'TIMED' ? null : score,
      penaltySeconds: penalty ?? 0,
      dqReason: draft.status === 'DISQUALIFIED' ? draft.dqReason.trim() : null,
      ...(event.usesHead && {
        axeId: draft.axeId || null,
        axeLabel: draft.axeLabel.trim() || null,
        grind: draft.grind || null,
        bevelIncludedDeg: bevel,
        chiselWidthMm: typeof chisel === 'number' ? Math.round(chisel * 100) / 100 : null,
      }),
      condition: draft.condition || null,
    },
  };
}

/** The server names input fields; the table names its cells. */
export function draftFieldFor(serverField: string | undefined): DraftField {
  const fields: Record<string, DraftField> = {
    times: 'time0', score: 'score', penaltySeconds: 'penalty', dqReason: 'dqReason', axeId: 'axeId', axeLabel: 'axeLabel',
    grind: 'grind', bevelIncludedDeg: 'bevel', chiselWidthMm: 'chisel', condition: 'condition', runOffRank: 'status',
  };
  return fields[serverField?.replace(/^input\./, '') ?? ''] ?? 'status';
}
