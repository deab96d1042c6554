export { rankResults } from './rank-results.js';
export {
  resultKinds,
  resultStatuses,
  type RankedEvent,
  type RankedResult,
  type RankOptions,
  type ResultInput,
  type ResultKind,
  type ResultStatus,
} from './result-types.js';
export { overTimeLimitReason } from './prepare-result.js';
export { scoreEvent, type ScoredEvent, type ScoredResult, type ScoringOptions } from './score-event.js';
export { placeTablePresets, type ScoringScheme } from './scoring-scheme.js';
export { ScoringInputError, type ScoringInputErrorCode } from './scoring-input-error.js';
export { meetTieBreak, seasonTieBreak } from './rank-club-totals.js';
export { teamTotals, type DivisionEvent } from './team-totals.js';
export { seasonStandings } from './season-standings.js';
export type {
  ClubStanding,
  DivisionStanding,
  MeetTotals,
  SeasonClubStanding,
  SeasonStandings,
} from './standings-types.js';
