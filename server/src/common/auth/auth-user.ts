import type { Role } from '@endgrain/shared';

/** What the bearer token proves about the caller; read fresh from the database per request. */
export interface AuthUser {
  id: string;
  email: string;
  role: Role;
  clubIds: string[];
}

export interface JwtClaims {
  sub: string;
  /** Token version: bumped on password reset or role change, so old tokens stop working. */
  tv: number;
}
