import type { User } from '../src/features/auth/api/types.js';

/** An invented member for tests. */
export function testUser(overrides: Partial<User> = {}): User {
  return {
    __typename: 'User',
    id: 'user-1',
    email: 'rowan.tamarack@example.org',
    displayName: 'Rowan Tamarack',
    role: 'ATHLETE',
    emailVerified: true,
    unitSystem: 'METRIC',
    clubs: [{ __typename: 'ClubMembership', clubId: 'club-1', clubName: 'Hollow Pine Woodsmen', role: 'ATHLETE' }],
    ...overrides,
  };
}
