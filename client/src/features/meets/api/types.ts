// Shapes of the meets API (server/schema.gql); replace with generated types once codegen lands.
import type { Division, MeetStatus } from '@endgrain/shared';

export type { Division, MeetStatus };
export type ScoringScheme = 'FIXED_TABLE' | 'FIELD_SIZE' | 'PERCENT_OF_BEST';
export type ResultKind = 'TIMED' | 'SCORED' | 'FEWEST_HITS';
export type MeetWhen = 'UPCOMING' | 'PAST';

export interface Season {
  __typename?: 'Season';
  id: string;
  name: string;
  startsOn: string;
  endsOn: string;
  isCurrent: boolean;
}

export interface ClubOption {
  __typename?: 'Club';
  id: string;
  name: string;
  shortName: string;
}

export interface EventType {
  __typename?: 'EventType';
  id: string;
  code: string;
  name: string;
  resultKind: ResultKind;
  teamSize: number;
  mixedPair: boolean;
  usesHead: boolean;
  description: string;
  defaultDiameters: { __typename?: 'DivisionDiameter'; division: string; diameterMm: number }[];
}

export interface EntryAthlete {
  __typename?: 'EntryAthlete';
  id: string;
  name: string;
}

export interface Entry {
  __typename?: 'Entry';
  id: string;
  meetEventId: string;
  clubId: string;
  clubName: string;
  clubShortName: string;
  label: string;
  athletes: EntryAthlete[];
  drawPosition: number | null;
  heat: number | null;
}

export interface MeetEvent {
  __typename?: 'MeetEvent';
  id: string;
  meetId: string;
  position: number;
  eventType: EventType;
  division: Division;
  speciesId: string | null;
  speciesName: string | null;
  diameterMm: number | null;
  timeLimitHundredths: number | null;
  weight: number;
  notes: string;
  scoringScheme: ScoringScheme | null;
  pointsTable: number[] | null;
  heatSize: number | null;
  drawSeed: number | null;
  entries: Entry[];
}

/** What the meets list and the meet page both show. */
export interface MeetScoring {
  scoringScheme: ScoringScheme;
  pointsTable: number[] | null;
  bestEntryPerClub: boolean;
  minimumOnePoint: boolean;
  runOffTopPlaces: number;
  maxEventsPerAthlete: number | null;
  requireMixedPairs: boolean;
}

export interface MeetSummary extends MeetScoring {
  __typename?: 'Meet' | 'MeetDetail';
  id: string;
  name: string;
  seasonId: string;
  seasonName: string;
  hostClubId: string;
  hostClubName: string;
  /** ISO date */
  startsOn: string;
  venue: string;
  /** ISO date-time */
  entryDeadline: string;
  divisions: Division[];
  status: MeetStatus;
  entriesOpen: boolean;
  eventCount: number;
  entryCount: number;
}

export interface MeetDetail extends MeetSummary {
  __typename?: 'MeetDetail';
  canManage: boolean;
  enterableClubIds: string[];
  /** The caller is one of this meet's appointed timekeepers. */
  isTimekeeper: boolean;
  events: MeetEvent[];
}

export interface MeetsFilter {
  when?: MeetWhen;
  seasonId?: string;
  clubId?: string;
  status?: MeetStatus;
}

export interface MeetInput extends MeetScoring {
  name: string;
  seasonId: string;
  hostClubId: string;
  startsOn: string;
  venue: string;
  entryDeadline: string;
  divisions: Division[];
  reason?: string | null;
}

export interface MeetEventInput {
  eventTypeId: string;
  division: Division;
  speciesId: string | null;
  diameterMm: number | null;
  timeLimitHundredths: number | null;
  weight: number;
  /** The event's own scoring, or null for the meet's. */
  scoringScheme: ScoringScheme | null;
  pointsTable: number[] | null;
  notes: string;
}

export interface RosterAthlete {
  __typename?: 'Athlete';
  id: string;
  name: string;
  divisions: Division[];
}

export interface ClubRoster {
  __typename?: 'ClubDetail';
  id: string;
  name: string;
  shortName: string;
  roster: RosterAthlete[];
}

/** The signed-in member's unit preference (METRIC when signed out). */
export type UnitPreference = 'METRIC' | 'IMPERIAL';

/** A recorded change to a meet after results were in; before and after are JSON of the scoring. */
export interface MeetChange {
  __typename?: 'MeetChange';
  id: string;
  summary: string;
  byName: string | null;
  at: string;
  before: string;
  after: string;
}
