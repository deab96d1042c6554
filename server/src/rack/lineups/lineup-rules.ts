import type { ExperienceLevelValue } from '../../league/entities/athlete.entity.js';
import type { AxeStatusValue, AxeUseValue } from '../entities/rack-values.js';

export interface LineupCheck {
  athlete: { name: string; experience: ExperienceLevelValue };
  axe: { label: string; status: AxeStatusValue; allowedFor: AxeUseValue } | null;
  overrideReason: string | null;
  /** Names of other athletes given the same axe in the same heat of the same event. */
  sameHeatAthletes: string[];
}

export type LineupVerdict =
  | { ok: false; field: 'axeId' | 'overrideReason'; message: string }
  | { ok: true; warnings: string[]; overrideUsed: boolean };

const RANK: Record<ExperienceLevelValue, number> = { ROOKIE: 0, DEVELOPING: 1, EXPERIENCED: 2 };
const LEAST: Record<AxeUseValue, ExperienceLevelValue> = { ANYONE: 'ROOKIE', DEVELOPING_UP: 'DEVELOPING', EXPERIENCED_ONLY: 'EXPERIENCED' };
const LEVEL_NAME: Record<ExperienceLevelValue, string> = { ROOKIE: 'a rookie', DEVELOPING: 'a developing athlete', EXPERIENCED: 'experienced' };
const USE_NAME: Record<AxeUseValue, string> = {
  ANYONE: 'anyone',
  DEVELOPING_UP: 'developing and experienced athletes only',
  EXPERIENCED_ONLY: 'experienced athletes only',
};
const OUT_OF_USE: Partial<Record<AxeStatusValue, string>> = {
  HEAD_LOOSE: 'has a loose head; tighten or rehang it and log the service before it is handed out',
  NEEDS_HANDLE: 'needs a new handle; rehang it and log the service before it is handed out',
  RETIRED: 'is retired and stays out of use',
};
export const OVERRIDE_REASON_MIN = 10;
export const OVERRIDE_REASON_MAX = 300;

/**
 * The rack's rules for handing an axe to an athlete. Refusals: an axe out of use (loose head,
 * needs handle, retired); an axe above the athlete's experience without an override reason.
 * Warnings: an axe that needs an edge; one axe given to two athletes in the same heat.
 */
export function checkLineup({ athlete, axe, overrideReason, sameHeatAthletes }: LineupCheck): LineupVerdict {
  if (!axe) return { ok: true, warnings: [], overrideUsed: false };
  const outOfUse = OUT_OF_USE[axe.status];
  if (outOfUse) return { ok: false, field: 'axeId', message: `${axe.label} ${outOfUse}.` };
  const warnings: string[] = [];
  let overrideUsed = false;
  if (RANK[athlete.experience] < RANK[LEAST[axe.allowedFor]]) {
    const reason = (overrideReason ?? '').trim();
    const rule = `${axe.label} is for ${USE_NAME[axe.allowedFor]}; ${athlete.name} is ${LEVEL_NAME[athlete.experience]}.`;
    if (reason.length < OVERRIDE_REASON_MIN || reason.length > OVERRIDE_REASON_MAX) {
      const ask = reason.length > OVERRIDE_REASON_MAX ? `Keep the reason under ${OVERRIDE_REASON_MAX} characters.` : `To hand it over anyway, give the reason for the override (at least ${OVERRIDE_REASON_MIN} characters); it is recorded.`;
      return { ok: false, field: 'overrideReason', message: `${rule} ${ask}` };
    }
    overrideUsed = true;
    warnings.push(`${rule} Override recorded: "${reason}".`);
  }
  if (axe.status === 'NEEDS_EDGE') warnings.push(`${axe.label} needs an edge: regrind or hone it before the meet, or pick another axe.`);
  if (sameHeatAthletes.length > 0) {
    warnings.push(`${axe.label} is also given to ${sameHeatAthletes.join(' and ')} in the same heat; one axe cannot be swung by two athletes at once.`);
  }
  return { ok: true, warnings, overrideUsed };
}
