import { HEAD_GRINDS, parseTime, type EventResultKind, type HeadGrind } from '@endgrain/shared';

import { DomainError } from '../common/errors/domain-error.js';
import type { RecordResultInput } from './dto/result.inputs.js';
import type { PostedResult } from './posted-result.js';

export interface AxeSetup {
  id: string;
  clubId: string;
  label: string;
  grind: HeadGrind;
  bevelIncludedDeg: number | null;
  chiselWidthMm: number | null;
}

export interface PostingContext {
  kind: EventResultKind;
  eventName: string;
  clubId: string;
  speciesId: string | null;
  diameterMm: number | null;
  axe: AxeSetup | null;
}

/**
 * Checks a result typed into the results table and turns it into stored values. The block's
 * species and diameter come from the meet event; the head comes from the chosen axe where
 * the organiser left a field empty (what was measured on the day wins over the rack).
 */
export function postedFromInput(input: RecordResultInput, context: PostingContext): PostedResult {
  const rawTimes = (input.times ?? []).filter((t) => t.trim() !== '').map((text, i) => {
    const parsed = parseTime(text);
    if (!parsed.ok) throw DomainError.badInput('times', `Watch ${i + 1}: ${parsed.message}.`);
    if (parsed.hundredths === 0) throw DomainError.badInput('times', `Watch ${i + 1}: 0.00 is no time; record a scratch instead.`);
    return parsed.hundredths;
  });
  if (rawTimes.length > 3) throw DomainError.badInput('times', 'Give one to three watch times.');
  const finished = input.status === 'FINISHED';
  const score = input.score ?? null;
  if (context.kind === 'TIMED') {
    if (score !== null) throw DomainError.badInput('score', `${context.eventName} is timed; it takes no score.`);
    if (finished && rawTimes.length === 0) throw DomainError.badInput('times', 'A finished run needs at least one watch time.');
  } else {
    if (finished && score === null) throw DomainError.badInput('score', context.kind === 'SCORED' ? 'A finished result needs its score.' : 'A finished result needs its hit count.');
    if (score !== null && (!Number.isFinite(score) || score < 0 || score > 100000)) throw DomainError.badInput('score', 'A score is a number from 0 up.');
    if (score !== null && context.kind === 'FEWEST_HITS' && !Number.isInteger(score)) throw DomainError.badInput('score', 'Hits are a whole number.');
  }
  if (input.status === 'SCRATCH' && rawTimes.length > 0) throw DomainError.badInput('times', 'A scratch has no time; clear the times or mark it finished.');
  const dqReason = input.dqReason?.trim() || null;
  if (input.status === 'DISQUALIFIED' && !dqReason) throw DomainError.badInput('dqReason', 'Say why the result was disqualified.');
  if (dqReason && dqReason.length > 200) throw DomainError.badInput('dqReason', 'Keep the reason under 200 characters.');
  const penalty = input.penaltySeconds ?? 0;
  if (!Number.isFinite(penalty) || penalty < 0 || penalty > 3600) throw DomainError.badInput('penaltySeconds', 'Penalty seconds are a number from 0 to 3600.');
  const runOffRank = input.runOffRank ?? null;
  if (runOffRank !== null && (!Number.isInteger(runOffRank) || runOffRank < 1 || runOffRank > 99)) throw DomainError.badInput('runOffRank', 'A run-off place is a whole number from 1.');
  return {
    status: input.status,
    dqReason: input.status === 'DISQUALIFIED' ? dqReason : null,
    rawTimes,
    score,
    penaltyHundredths: Math.round(penalty * 100),
    runOffRank,
    ...head(input, context),
    speciesId: context.speciesId,
    diameterMm: context.diameterMm,
    blockCondition: input.condition ?? null,
  };
}

function head(input: RecordResultInput, context: PostingContext): Pick<PostedResult, 'axeId' | 'axeLabel' | 'grind' | 'bevelIncludedDeg' | 'chiselWidthMm'> {
  const axe = context.axe;
  if (axe && axe.clubId !== context.clubId) throw DomainError.badInput('axeId', "Pick an axe from the entrant's own club rack.");
  const grind = input.grind ?? axe?.grind ?? null;
  if (grind !== null && !HEAD_GRINDS.includes(grind as HeadGrind)) throw DomainError.badInput('grind', `Grind is one of ${HEAD_GRINDS.join(', ')}.`);
  const bevel = input.bevelIncludedDeg ?? axe?.bevelIncludedDeg ?? null;
  if (bevel !== null && (!Number.isFinite(bevel) || bevel < 5 || bevel > 90)) throw DomainError.badInput('bevelIncludedDeg', 'An included bevel angle is 5° to 90°.');
  const chisel = input.chiselWidthMm ?? axe?.chiselWidthMm ?? null;
  if (chisel !== null && (!Number.isFinite(chisel) || chisel < 0 || chisel > 60)) throw DomainError.badInput('chiselWidthMm', 'A chisel width is 0 to 60 mm.');
  const label = input.axeLabel?.trim() || axe?.label || null;
  if (label && label.length > 40) throw DomainError.badInput('axeLabel', 'An axe label is at most 40 characters.');
  return {
    axeId: axe?.id ?? null,
    axeLabel: label,
    grind: grind as HeadGrind | null,
    bevelIncludedDeg: bevel === null ? null : Math.round(bevel * 100) / 100,
    chiselWidthMm: chisel === null ? null : Math.round(chisel * 100) / 100,
  };
}
