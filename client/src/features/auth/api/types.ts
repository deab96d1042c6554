// Shapes of the accounts API (server/schema.gql); replace with generated types once codegen lands.
import type { Role } from '@endgrain/shared';

export type { Role };
export type UnitSystem = 'METRIC' | 'IMPERIAL';

export interface ClubMembership {
  __typename?: 'ClubMembership';
  clubId: string;
  clubName: string;
  role: Role;
}

export interface User {
  __typename?: 'User';
  id: string;
  email: string;
  displayName: string;
  role: Role;
  emailVerified: boolean;
  unitSystem: UnitSystem;
  clubs: ClubMembership[];
}

export interface AuthPayload {
  __typename?: 'AuthPayload';
  accessToken: string;
  user: User;
}

export interface SignInInput {
  email: string;
  password: string;
}

export interface SignUpInput extends SignInInput {
  displayName: string;
}
