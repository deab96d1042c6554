import { formatLength, speciesById } from '@endgrain/shared';

import { DomainError } from '../common/errors/domain-error.js';
import { isoDate } from '../league/league.validation.js';
import { optionalText } from '../rack/rack.validation.js';
import type { SaveTrialInput, TrialRunInput, TrialTesterInput } from './dto/save-trial.input.js';
import type { KeennessValue, StoredSwing, TrialConditionValue } from './entities/trial-values.js';

// Sanity bounds, not rules of the sport (common practice): wide enough for any block or
// swing, narrow enough to catch inches typed into a millimetre box and the like.
export const DIAMETER_MM = { min: 100, max: 1000 };
/** The same ceiling as the shared trial schema (`trialSwingSchema`). */
export const SWING_DEPTH_MM = { min: 0, max: 400 };
export const AIR_TEMP_C = { min: -40, max: 45 };
export const MAX_TESTERS = 12;
export const MAX_RUNS = 60;
export const MAX_SWINGS_PER_RUN = 40;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const both = (mm: number): string => `${formatLength(mm, 'metric')} (${formatLength(mm, 'imperial')})`;

export interface TesterValues {
  id: string;
  athleteId: string | null;
  /** Empty when the athlete's roster name is to be used. */
  name: string;
  position: number;
}

export interface RunValues {
  id: string;
  axeId: string;
  testerId: string;
  position: number;
  swings: StoredSwing[];
  releaseStep: number | null;
  keenness: KeennessValue | null;
  feel: string;
  notes: string;
}

export interface TrialValues {
  testedOn: string;
  speciesId: string;
  diameterMm: number;
  condition: TrialConditionValue;
  knots: string;
  faceUsed: string;
  airTempC: number | null;
  referenceAxeId: string;
  notes: string;
  testers: TesterValues[];
  runs: RunValues[];
}

export function uuid(field: string, raw: string | null | undefined): string {
  if (!UUID.test(raw ?? '')) throw DomainError.badInput(field, 'Ids are UUIDs chosen by the recording device.');
  return (raw as string).toLowerCase();
}

/** Checks everything in a saved trial that needs no database; the service checks axes and athletes. */
export function trialValues(input: SaveTrialInput, now = new Date()): TrialValues {
  const testers = input.testers.map(testerValues);
  if (testers.length === 0) throw DomainError.badInput('testers', 'Name at least one tester.');
  if (testers.length > MAX_TESTERS) throw DomainError.badInput('testers', `A trial has at most ${MAX_TESTERS} testers.`);
  assertUnique('testers', testers.map((t) => t.id));
  if (input.runs.length > MAX_RUNS) throw DomainError.badInput('runs', `A trial has at most ${MAX_RUNS} axe runs.`);
  const testerIds = new Set(testers.map((t) => t.id));
  const runs = input.runs.map((run, i) => runValues(run, i, testerIds));
  assertUnique('runs', runs.map((r) => r.id));
  return {
    testedOn: testedOn(input.testedOn, now),
    speciesId: species(input.speciesId),
    diameterMm: diameter(input.diameterMm),
    condition: input.condition as TrialConditionValue,
    knots: optionalText('knots', 'Knots', input.knots, 200),
    faceUsed: optionalText('faceUsed', 'Face used', input.faceUsed, 120),
    airTempC: airTemp(input.airTempC),
    referenceAxeId: uuid('referenceAxeId', input.referenceAxeId),
    notes: optionalText('notes', 'Notes', input.notes, 2000),
    testers,
    runs,
  };
}

function testerValues(input: TrialTesterInput, position: number): TesterValues {
  const field = `testers.${position}`;
  const athleteId = input.athleteId ? uuid(`${field}.athleteId`, input.athleteId) : null;
  const name = optionalText(`${field}.name`, 'Tester name', input.name, 130).replace(/\s+/g, ' ');
  if (!athleteId && name.length === 0) throw DomainError.badInput(`${field}.name`, 'Give the tester a name or pick them from the roster.');
  return { id: uuid(`${field}.id`, input.id), athleteId, name, position };
}

function runValues(input: TrialRunInput, position: number, testerIds: ReadonlySet<string>): RunValues {
  const field = `runs.${position}`;
  const testerId = uuid(`${field}.testerId`, input.testerId);
  if (!testerIds.has(testerId)) throw DomainError.badInput(`${field}.testerId`, 'Pick the tester from the trial’s testers.');
  if (input.swings.length > MAX_SWINGS_PER_RUN) throw DomainError.badInput(`${field}.swings`, `Record at most ${MAX_SWINGS_PER_RUN} swings for one axe and tester.`);
  const swings = input.swings.map((swing, s) => ({ depthMm: depth(`${field}.swings.${s}.depthMm`, swing.depthMm), opening: Boolean(swing.opening) }));
  const step = input.releaseStep ?? null;
  if (step !== null && !(Number.isInteger(step) && step >= 1 && step <= 5)) {
    throw DomainError.badInput(`${field}.releaseStep`, 'Release is a step from 1 (holds fast) to 5 (springs out).');
  }
  return {
    id: uuid(`${field}.id`, input.id),
    axeId: uuid(`${field}.axeId`, input.axeId),
    testerId,
    position,
    swings,
    releaseStep: step,
    keenness: (input.keenness ?? null) as KeennessValue | null,
    feel: optionalText(`${field}.feel`, 'Feel', input.feel, 200),
    notes: optionalText(`${field}.notes`, 'Notes', input.notes, 1000),
  };
}

function testedOn(raw: string, now: Date): string {
  const day = isoDate('testedOn', 'Test date', raw);
  // One day of slack: a phone east of the server's clock may already be on tomorrow.
  const latest = new Date(now.getTime() + 86_400_000).toISOString().slice(0, 10);
  if (day > latest) throw DomainError.badInput('testedOn', 'A trial cannot be dated in the future.');
  if (day < '2000-01-01') throw DomainError.badInput('testedOn', 'Check the year of the test date.');
  return day;
}

function species(raw: string): string {
  if (!speciesById(raw)) throw DomainError.badInput('speciesId', 'Pick the species from the species table.');
  return raw;
}

function diameter(raw: number): number {
  if (!Number.isFinite(raw) || raw < DIAMETER_MM.min || raw > DIAMETER_MM.max) {
    throw DomainError.badInput('diameterMm', `Block diameter must be between ${both(DIAMETER_MM.min)} and ${both(DIAMETER_MM.max)}.`);
  }
  return Math.round(raw * 10) / 10;
}

function depth(field: string, raw: number): number {
  if (!Number.isFinite(raw) || raw < SWING_DEPTH_MM.min || raw > SWING_DEPTH_MM.max) {
    throw DomainError.badInput(field, `A swing's depth must be between ${both(SWING_DEPTH_MM.min)} and ${both(SWING_DEPTH_MM.max)}.`);
  }
  return Math.round(raw * 100) / 100;
}

function airTemp(raw: number | null | undefined): number | null {
  if (raw == null) return null;
  if (!Number.isFinite(raw) || raw < AIR_TEMP_C.min || raw > AIR_TEMP_C.max) {
    throw DomainError.badInput('airTempC', `Air temperature must be between ${AIR_TEMP_C.min} °C and ${AIR_TEMP_C.max} °C.`);
  }
  return Math.round(raw * 10) / 10;
}

function assertUnique(field: string, ids: readonly string[]): void {
  if (new Set(ids).size !== ids.length) throw DomainError.badInput(field, 'Each entry needs its own id.');
}
