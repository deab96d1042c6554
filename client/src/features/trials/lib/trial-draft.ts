import type { SaveTrialInput, Trial, TrialCondition, UnitPreference } from '../api/types.js';
import { newId } from './new-id.js';

export type LengthUnit = 'mm' | 'in';

/** Where the phone's copy stands: kept here only, on its way, on the server, or refused. */
export type SyncState = 'unsent' | 'sending' | 'sent' | 'refused' | 'conflict';

/** Testers and runs are held exactly as the server takes them. */
export type DraftTester = SaveTrialInput['testers'][number];
export type DraftRun = SaveTrialInput['runs'][number];

/** A whole trial as the phone holds it; text fields are kept as typed until they are sent. */
export interface TrialDraft {
  id: string;
  clubId: string;
  /** The server version this copy started from; null until it has been saved once. */
  baseVersion: number | null;
  /** New on every change, so the server can tell a resend from a new edit. */
  saveToken: string;
  /** The token of a send whose answer never came: the server may already hold that copy. */
  unansweredToken: string | null;
  testedOn: string;
  speciesId: string;
  diameterText: string;
  diameterUnit: LengthUnit;
  condition: TrialCondition | null;
  knots: string;
  faceUsed: string;
  airTempText: string;
  referenceAxeId: string;
  notes: string;
  testers: DraftTester[];
  runs: DraftRun[];
  sync: SyncState;
  /** The server's words when it refused the copy. */
  problem: string | null;
  changedAt: string;
  sentAt: string | null;
}

export function unitFor(units: UnitPreference): LengthUnit {
  return units === 'IMPERIAL' ? 'in' : 'mm';
}

export function newDraft(clubId: string, options: { today: string; units: UnitPreference; now: string }): TrialDraft {
  return {
    id: newId(),
    clubId,
    baseVersion: null,
    saveToken: newId(),
    unansweredToken: null,
    testedOn: options.today,
    speciesId: '',
    diameterText: '',
    diameterUnit: unitFor(options.units),
    condition: null,
    knots: '',
    faceUsed: '',
    airTempText: '',
    referenceAxeId: '',
    notes: '',
    testers: [],
    runs: [],
    sync: 'unsent',
    problem: null,
    changedAt: options.now,
    sentAt: null,
  };
}

/** A change made on the phone: a fresh save token and "saved on this phone" until it is sent. */
export function changed(draft: TrialDraft, patch: Partial<TrialDraft>, now: string): TrialDraft {
  return { ...draft, ...patch, saveToken: newId(), sync: 'unsent', problem: null, changedAt: now };
}

function trimNumber(value: number, digits: number): string {
  return String(Number(value.toFixed(digits)));
}

/** The server's copy as a draft, diameter shown in the reader's unit. */
export function draftFromTrial(trial: Trial, options: { units: UnitPreference; now: string }): TrialDraft {
  const unit = unitFor(options.units);
  return {
    id: trial.id,
    clubId: trial.clubId,
    baseVersion: trial.version,
    saveToken: newId(),
    unansweredToken: null,
    testedOn: trial.testedOn,
    speciesId: trial.speciesId,
    diameterText: unit === 'in' ? trimNumber(trial.diameterMm / 25.4, 2) : trimNumber(trial.diameterMm, 1),
    diameterUnit: unit,
    condition: trial.condition,
    knots: trial.knots,
    faceUsed: trial.faceUsed,
    airTempText: trial.airTempC === null ? '' : String(trial.airTempC),
    referenceAxeId: trial.referenceAxeId,
    notes: trial.notes,
    testers: trial.testers.map((t) => ({ id: t.id, athleteId: t.athleteId, name: t.name })),
    runs: trial.runs.map((r) => ({
      id: r.id,
      axeId: r.axeId,
      testerId: r.testerId,
      swings: r.swings.map((s) => ({ depthMm: s.depthMm, opening: s.opening })),
      releaseStep: r.releaseStep,
      keenness: r.keenness,
      feel: r.feel,
      notes: r.notes,
    })),
    sync: 'sent',
    problem: null,
    changedAt: options.now,
    sentAt: options.now,
  };
}
