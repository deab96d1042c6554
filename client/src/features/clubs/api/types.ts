// Shapes of the clubs API (server/schema.gql); replace with generated types once codegen lands.
import type { Division, ExperienceLevel } from '@endgrain/shared';

export type { Division, ExperienceLevel };
export type ClubRole = 'COACH' | 'ATHLETE';

export interface Club {
  __typename?: 'Club';
  id: string;
  name: string;
  shortName: string;
  region: string;
  colourPrimary: string;
  colourSecondary: string;
  athleteCount: number;
}

export interface Athlete {
  __typename?: 'Athlete';
  id: string;
  clubId: string;
  clubName: string;
  firstName: string;
  lastName: string;
  name: string;
  divisions: Division[];
  experience: ExperienceLevel;
  firstSeasonYear: number | null;
  hasAccount: boolean;
}

export interface ClubDetail extends Omit<Club, '__typename'> {
  __typename?: 'ClubDetail';
  /** Shown to signed-in members only. */
  contactEmail: string | null;
  canManage: boolean;
  roster: Athlete[];
}

export interface ClubInvitation {
  __typename?: 'ClubInvitation';
  id: string;
  email: string;
  role: ClubRole;
  expiresAt: string;
  acceptedAt: string | null;
}

export interface AthleteInput {
  clubId: string;
  firstName: string;
  lastName: string;
  divisions: Division[];
  experience: ExperienceLevel;
  firstSeasonYear: number | null;
}

export interface ClubInput {
  name: string;
  shortName: string;
  region: string;
  contactEmail: string | null;
  colourPrimary: string;
  colourSecondary: string;
}
