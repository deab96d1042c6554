import { parseLength } from '@endgrain/shared';

import type { SaveTrialInput } from '../api/types.js';
import type { LengthUnit, TrialDraft } from './trial-draft.js';

export interface DraftProblem {
  /** The block field or section it is about, to show beside it. */
  field: 'testedOn' | 'speciesId' | 'diameter' | 'condition' | 'airTemp' | 'referenceAxeId' | 'testers';
  message: string;
}

export type DraftCheck = { ok: true; input: SaveTrialInput } | { ok: false; problems: DraftProblem[] };

/** A length typed with the chosen unit beside it ("12", "12 1/2", "304,8"), in millimetres. */
export function lengthInMm(text: string, unit: LengthUnit): number | null {
  const cleaned = text.trim().replace(',', '.');
  if (cleaned === '') return null;
  const parsed = parseLength(`${cleaned} ${unit}`);
  return parsed.ok ? parsed.mm : null;
}

function airTemp(text: string): number | null | 'bad' {
  const cleaned = text.trim().replace(',', '.').replace('−', '-');
  if (cleaned === '') return null;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : 'bad';
}

/**
 * What the phone can send: the block, at least one tester and a reference axe are needed first.
 * The server checks again (and more); this only keeps an unfinished draft on the phone.
 */
export function draftToInput(draft: TrialDraft): DraftCheck {
  const problems: DraftProblem[] = [];
  if (!/^\d{4}-\d{2}-\d{2}$/.test(draft.testedOn)) problems.push({ field: 'testedOn', message: 'Give the test date.' });
  if (!draft.speciesId) problems.push({ field: 'speciesId', message: 'Pick the species of the block.' });
  const diameterMm = lengthInMm(draft.diameterText, draft.diameterUnit);
  if (diameterMm === null) problems.push({ field: 'diameter', message: `Give the block diameter in ${draft.diameterUnit === 'in' ? 'inches' : 'millimetres'}.` });
  if (!draft.condition) problems.push({ field: 'condition', message: 'Pick the condition of the block.' });
  const temp = airTemp(draft.airTempText);
  if (temp === 'bad') problems.push({ field: 'airTemp', message: 'Write the air temperature as a number of degrees Celsius, or leave it empty.' });
  if (!draft.referenceAxeId) problems.push({ field: 'referenceAxeId', message: 'Pick the reference axe every axe is compared with.' });
  if (draft.testers.length === 0) problems.push({ field: 'testers', message: 'Add at least one tester.' });
  if (problems.length > 0) return { ok: false, problems };
  return {
    ok: true,
    input: {
      id: draft.id,
      clubId: draft.clubId,
      baseVersion: draft.baseVersion,
      saveToken: draft.saveToken,
      unansweredToken: draft.unansweredToken,
      testedOn: draft.testedOn,
      speciesId: draft.speciesId,
      diameterMm: diameterMm!,
      condition: draft.condition!,
      knots: draft.knots.trim(),
      faceUsed: draft.faceUsed.trim(),
      airTempC: temp as number | null,
      referenceAxeId: draft.referenceAxeId,
      notes: draft.notes.trim(),
      testers: draft.testers.map((t) => ({ id: t.id, athleteId: t.athleteId, name: t.name })),
      runs: draft.runs.map((r) => ({ ...r })),
    },
  };
}

/** At or below 0 °C the wood may be frozen: competition edges stay out of it. */
export function isFreezing(draft: Pick<TrialDraft, 'condition' | 'airTempText'>): boolean {
  const temp = airTemp(draft.airTempText);
  return draft.condition === 'FROZEN' || (typeof temp === 'number' && temp <= 0);
}
