// Shapes of the standings API (server/schema.gql); replace with generated types once codegen lands.
import type { Division } from '@endgrain/shared';

export type { Division };

export interface ClubStanding {
  __typename?: 'ClubStanding';
  clubId: string;
  clubName: string;
  clubShortName: string;
  points: number;
  place: number;
  tied: boolean;
  placeCounts: number[];
  meets: number;
}

export interface DivisionStanding {
  __typename?: 'DivisionStanding';
  division: Division;
  provisional: boolean;
  clubs: ClubStanding[];
}

export interface SeasonStandings {
  __typename?: 'SeasonStandings';
  seasonId: string;
  seasonName: string;
  tieBreak: string;
  provisional: boolean;
  meets: { __typename?: 'StandingsMeet'; id: string; name: string; startsOn: string }[];
  divisions: DivisionStanding[];
}

export interface EventWinner {
  __typename?: 'Result';
  id: string;
  meetEventId: string;
  eventName: string;
  division: Division;
  label: string;
  clubShortName: string;
  resultKind: 'TIMED' | 'SCORED' | 'FEWEST_HITS';
  totalHundredths: number | null;
  score: number | null;
  tied: boolean;
}

export interface MeetStandings {
  __typename?: 'MeetStandings';
  meetId: string;
  meetName: string;
  published: boolean;
  tieBreak: string;
  provisional: boolean;
  divisions: DivisionStanding[];
  eventWinners: EventWinner[];
}

export interface SeasonOption {
  __typename?: 'Season';
  id: string;
  name: string;
  isCurrent: boolean;
}
