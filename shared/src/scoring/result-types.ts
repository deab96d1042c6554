/** Timed: lower time wins. Scored: higher score wins. Fewest hits: fewer hits win. */
export type ResultKind = 'timed' | 'scored' | 'fewest-hits';
export const resultKinds: readonly ResultKind[] = ['timed', 'scored', 'fewest-hits'];

/** `scratch`: entered but no time (did not run). */
export type ResultStatus = 'finished' | 'scratch' | 'did-not-finish' | 'disqualified';
export const resultStatuses: readonly ResultStatus[] = ['finished', 'scratch', 'did-not-finish', 'disqualified'];

/** One entry's result as posted; `id` and `clubId` are opaque and passed through. */
export interface ResultInput {
  id: string;
  clubId: string;
  status: ResultStatus;
  /** Official time in hundredths before penalties. Needed when a timed result is finished. */
  timeHundredths?: number | null;
  /** Points for a scored event, hit count for a fewest-hits event. Needed when finished. */
  score?: number | null;
  /** Added to the time (to the tie-breaking time in scored and fewest-hits events). */
  penaltySeconds?: number | null;
  /** The officials' reason for a disqualification, kept as given. */
  reason?: string | null;
  /** Finishing order of a run-off among tied results: 1 won it; equal values tied again. */
  runOffRank?: number | null;
}

export interface RankOptions {
  kind: ResultKind;
  /** A finished run whose time (before penalties) is over this is disqualified. */
  timeLimitHundredths?: number | null;
  /** Ties covering any of the top N places go to a run-off instead of sharing the place. */
  runOffTopPlaces?: number | null;
}

export interface RankedResult {
  id: string;
  clubId: string;
  /** After the time limit: an over-limit run reads `disqualified`. */
  status: ResultStatus;
  reason: string | null;
  /** 1-based; results that tie share it and the next place is skipped. Null when not finished. */
  place: number | null;
  tied: boolean;
  /** Tied in the run-off zone with no run-off result yet: the place is shared only provisionally. */
  needsRunOff: boolean;
  timeHundredths: number | null;
  penaltyHundredths: number;
  /** Time plus penalties; what ranks a timed event. */
  totalHundredths: number | null;
  score: number | null;
}

export interface RankedEvent {
  kind: ResultKind;
  /** Finished results in place order, then did-not-finish, disqualified and scratch ones. */
  results: RankedResult[];
  runOffsPending: boolean;
}
