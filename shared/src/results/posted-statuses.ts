import type { ResultStatus } from '../scoring/result-types.js';

/** A result's status as the server and database spell it; the scoring engine spells it in kebab case. */
export const POSTED_STATUSES = ['FINISHED', 'SCRATCH', 'DID_NOT_FINISH', 'DISQUALIFIED'] as const;
export type PostedStatus = (typeof POSTED_STATUSES)[number];

export const POSTED_STATUS_LABELS: Record<PostedStatus, string> = {
  FINISHED: 'Finished',
  SCRATCH: 'Scratch / no time',
  DID_NOT_FINISH: 'Did not finish',
  DISQUALIFIED: 'Disqualified',
};

const TO_SCORING: Record<PostedStatus, ResultStatus> = {
  FINISHED: 'finished',
  SCRATCH: 'scratch',
  DID_NOT_FINISH: 'did-not-finish',
  DISQUALIFIED: 'disqualified',
};

export function toScoringStatus(status: PostedStatus): ResultStatus {
  return TO_SCORING[status];
}

export function fromScoringStatus(status: ResultStatus): PostedStatus {
  const found = POSTED_STATUSES.find((posted) => TO_SCORING[posted] === status);
  if (!found) throw new RangeError(`unknown result status "${status}"`);
  return found;
}
