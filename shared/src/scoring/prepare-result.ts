import { roundHalfUp } from '../units/round-half-up.js';
import type { RankOptions, ResultInput, ResultStatus } from './result-types.js';
import { ScoringInputError } from './scoring-input-error.js';

export interface PreparedResult {
  input: ResultInput;
  status: ResultStatus;
  reason: string | null;
  timeHundredths: number | null;
  penaltyHundredths: number;
  totalHundredths: number | null;
  score: number | null;
}

export const overTimeLimitReason = 'over time limit';

/**
 * Checks one row and works out what ranks it: penalties added to the time, and a finished
 * run over the time limit turned into a disqualification. The limit is compared with the
 * time before penalties: it bounds the run itself, penalties are scoring on top of it.
 */
export function prepareResult(input: ResultInput, options: RankOptions): PreparedResult {
  const fail = (message: string): never => {
    throw new ScoringInputError('invalid-result', `result ${input.id}: ${message}`, input.id);
  };
  const time = input.timeHundredths ?? null;
  if (time !== null && (!Number.isSafeInteger(time) || time < 0)) fail('a time is whole, non-negative hundredths');
  const score = input.score ?? null;
  if (score !== null && (!Number.isFinite(score) || score < 0)) fail('a score is a non-negative number');
  const penaltySeconds = input.penaltySeconds ?? 0;
  if (!Number.isFinite(penaltySeconds) || penaltySeconds < 0) fail('penalty seconds are a non-negative number');

  if (input.status === 'finished') {
    if (options.kind === 'timed' && (time === null || time === 0)) fail('a finished timed result needs a time');
    if (options.kind !== 'timed' && score === null) fail(`a finished ${options.kind} result needs a score`);
    if (options.kind === 'fewest-hits' && !Number.isInteger(score)) fail('hits are a whole number');
  }

  const penaltyHundredths = Math.round(roundHalfUp(penaltySeconds, 2) * 100);
  const limit = options.timeLimitHundredths ?? null;
  const overLimit = input.status === 'finished' && limit !== null && time !== null && time > limit;
  return {
    input,
    status: overLimit ? 'disqualified' : input.status,
    reason: overLimit ? overTimeLimitReason : (input.reason ?? null),
    timeHundredths: time,
    penaltyHundredths,
    totalHundredths: time === null ? null : time + penaltyHundredths,
    score,
  };
}
