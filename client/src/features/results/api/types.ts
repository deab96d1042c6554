// Shapes of the results API (server/schema.gql); replace with generated types once codegen lands.
import type { BlockCondition, Division, HeadGrind, MeetStatus, PostedStatus } from '@endgrain/shared';

export type { BlockCondition, Division, HeadGrind, MeetStatus, PostedStatus };
export type ResultKind = 'TIMED' | 'SCORED' | 'FEWEST_HITS';
export type UnitPreference = 'METRIC' | 'IMPERIAL';

export interface ResultAthlete {
  __typename?: 'EntryAthlete';
  id: string;
  name: string;
}

export interface Result {
  __typename?: 'Result';
  id: string;
  entryId: string;
  meetEventId: string;
  meetId: string;
  meetName: string;
  meetDate: string;
  eventTypeId: string;
  eventName: string;
  resultKind: ResultKind;
  division: Division;
  clubId: string;
  clubName: string;
  clubShortName: string;
  athletes: ResultAthlete[];
  label: string;
  status: PostedStatus;
  postedStatus: PostedStatus;
  reason: string | null;
  rawTimes: number[];
  timeHundredths: number | null;
  penaltyHundredths: number;
  totalHundredths: number | null;
  score: number | null;
  place: number | null;
  tied: boolean;
  points: number;
  countsForClub: boolean;
  provisional: boolean;
  runOffRank: number | null;
  axeId: string | null;
  axeLabel: string | null;
  grind: HeadGrind | null;
  bevelIncludedDeg: number | null;
  chiselWidthMm: number | null;
  speciesId: string | null;
  speciesName: string | null;
  diameterMm: number | null;
  condition: BlockCondition | null;
}

export interface WaitingEntry {
  __typename?: 'Entry';
  id: string;
  clubId: string;
  clubName: string;
  clubShortName: string;
  label: string;
  drawPosition: number | null;
  heat: number | null;
}

export interface MeetEventResults {
  __typename?: 'MeetEventResults';
  meetEventId: string;
  meetId: string;
  eventTypeId: string;
  eventName: string;
  resultKind: ResultKind;
  division: Division;
  usesHead: boolean;
  speciesId: string | null;
  speciesName: string | null;
  diameterMm: number | null;
  timeLimitHundredths: number | null;
  weight: number;
  provisional: boolean;
  results: Result[];
  waiting: WaitingEntry[];
}

export interface MeetResults {
  __typename?: 'MeetResults';
  meetId: string;
  meetName: string;
  startsOn: string;
  venue: string;
  seasonId: string;
  seasonName: string;
  status: MeetStatus;
  published: boolean;
  canRecord: boolean;
  canPublish: boolean;
  asTimekeeper: boolean;
  events: MeetEventResults[];
}

export interface RecordResultInput {
  entryId: string;
  status: PostedStatus;
  times?: string[];
  score?: number | null;
  penaltySeconds?: number | null;
  dqReason?: string | null;
  runOffRank?: number | null;
  axeId?: string | null;
  axeLabel?: string | null;
  grind?: HeadGrind | null;
  bevelIncludedDeg?: number | null;
  chiselWidthMm?: number | null;
  condition?: BlockCondition | null;
}

export interface CorrectResultInput extends RecordResultInput {
  correctionReason: string;
}

export interface ResultsFilter {
  seasonId?: string;
  meetId?: string;
  clubId?: string;
  eventTypeId?: string;
  division?: Division;
  speciesId?: string;
  diameterMinMm?: number;
  diameterMaxMm?: number;
  grind?: HeadGrind;
  bevelMinDeg?: number;
  bevelMaxDeg?: number;
  condition?: BlockCondition;
  finishedOnly?: boolean;
}

export type ResultSortField = 'TIME' | 'SCORE' | 'PLACE' | 'POINTS' | 'DATE' | 'DIAMETER' | 'BEVEL';
export interface ResultsSort {
  field: ResultSortField;
  direction: 'ASC' | 'DESC';
}

export interface ResultsPage {
  __typename?: 'ResultsPage';
  total: number;
  capped: boolean;
  page: number;
  pageSize: number;
  rows: Result[];
}

export interface PersonalBest {
  __typename?: 'PersonalBest';
  eventTypeId: string;
  eventName: string;
  diameterMm: number | null;
  result: Result;
}

export interface AthleteResults {
  __typename?: 'AthleteResults';
  athleteId: string;
  name: string;
  clubId: string;
  clubName: string;
  personalBests: PersonalBest[];
  results: Result[];
}

export interface ResultRecord {
  __typename?: 'ResultRecord';
  eventTypeId: string;
  eventName: string;
  speciesId: string | null;
  speciesName: string | null;
  diameterMm: number | null;
  result: Result;
}

export interface RackAxe {
  __typename?: 'Axe';
  id: string;
  label: string;
  grind: HeadGrind;
  status: string;
  geometry: { __typename?: 'HeadGeometry'; includedAngleDeg: number | null; chiselWidthMm: number | null };
}

export interface ExplorerOptions {
  seasons: { __typename?: 'Season'; id: string; name: string; isCurrent: boolean }[];
  clubs: { __typename?: 'Club'; id: string; name: string; shortName: string }[];
  eventTypes: { __typename?: 'EventType'; id: string; name: string; resultKind: ResultKind }[];
}

/** One preview line of a sheet upload (REST), or one problem found in it. */
export interface SheetPreviewRow {
  row: number;
  event: string;
  division: string;
  club: string;
  athletes: string;
  status: PostedStatus;
  officialHundredths: number | null;
  score: number | null;
  action: 'NEW' | 'CHANGED' | 'UNCHANGED';
}

export interface SheetProblem {
  row: number;
  column: string;
  message: string;
}

/** Someone an organiser appointed to post one meet's results. */
export interface MeetTimekeeper {
  __typename?: 'MeetTimekeeper';
  userId: string;
  displayName: string;
  email: string;
  appointedAt: string;
}

/** One change in a meet's results log; before and after are JSON snapshots of the result. */
export interface ResultAuditEntry {
  __typename?: 'ResultAudit';
  id: string;
  resultId: string;
  entryId: string;
  action: 'RECORDED' | 'CORRECTED' | 'IMPORTED';
  reason: string | null;
  byName: string | null;
  at: string;
  before: string | null;
  after: string;
}
