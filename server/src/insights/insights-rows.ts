import type { RaceResult, TrialInput } from '@endgrain/shared';

/** One race row as the repository reads it, with what the drill-down shows beside it. */
export interface RaceRow extends RaceResult {
  athleteName: string;
  clubId: string;
  meetName: string;
  meetDate: string;
}

export interface TrialRow extends TrialInput {
  trialId: string;
  clubId: string;
  testedOn: string;
}

/** The change stamp of the rows a matrix was computed from: any correction moves it. */
export interface RowsStamp {
  results: number;
  newestResult: string | null;
  newestMeet: string | null;
  trials: number;
  newestTrial: string | null;
}

/** Database grind and condition words are upper case; the shared rules use lower-case ids. */
export const toId = (value: string): string => value.toLowerCase();
export const toDb = (value: string): string => value.toUpperCase();
