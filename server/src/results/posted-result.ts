import type { BlockCondition, HeadGrind, PostedStatus } from '@endgrain/shared';

import type { ResultEntity } from './entities/result.entity.js';

/** What an organiser posts for one entry; everything else on a result is computed from it. */
export interface PostedResult {
  status: PostedStatus;
  dqReason: string | null;
  rawTimes: number[];
  score: number | null;
  penaltyHundredths: number;
  runOffRank: number | null;
  axeId: string | null;
  axeLabel: string | null;
  grind: HeadGrind | null;
  bevelIncludedDeg: number | null;
  chiselWidthMm: number | null;
  speciesId: string | null;
  diameterMm: number | null;
  blockCondition: BlockCondition | null;
}

const KEYS: readonly (keyof PostedResult)[] = [
  'status', 'dqReason', 'rawTimes', 'score', 'penaltyHundredths', 'runOffRank', 'axeId', 'axeLabel', 'grind',
  'bevelIncludedDeg', 'chiselWidthMm', 'speciesId', 'diameterMm', 'blockCondition',
];

export function postedOf(result: ResultEntity): PostedResult {
  return Object.fromEntries(KEYS.map((key) => [key, result[key]])) as unknown as PostedResult;
}

/** Same values, so a re-uploaded sheet changes nothing (decimals compared as stored, to the hundredth). */
export function samePosted(a: PostedResult, b: PostedResult): boolean {
  return KEYS.every((key) => JSON.stringify(normal(a[key])) === JSON.stringify(normal(b[key])));
}

function normal(value: unknown): unknown {
  return typeof value === 'number' ? Math.round(value * 100) / 100 : value;
}

/** The audit log's picture of a result: what was posted and what it earned. */
export function auditView(result: ResultEntity): Record<string, unknown> {
  return {
    ...postedOf(result),
    timeHundredths: result.timeHundredths,
    finalStatus: result.finalStatus,
    place: result.place,
    points: result.points,
  };
}
