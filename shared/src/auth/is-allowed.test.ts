import { describe, expect, it } from '@jest/globals';

import { canReachClub, isAllowed } from './is-allowed.js';

describe('isAllowed', () => {
  it('refuses a signed-out visitor any role-guarded action', () => {
    expect(isAllowed(null, ['ATHLETE'])).toBe(false);
  });

  it('lets an admin do everything', () => {
    expect(isAllowed({ role: 'ADMIN' }, ['ORGANISER'])).toBe(true);
  });

  it('refuses an athlete an organiser-only action', () => {
    expect(isAllowed({ role: 'ATHLETE' }, ['ORGANISER'])).toBe(false);
  });

  it('accepts a role that is listed', () => {
    expect(isAllowed({ role: 'COACH' }, ['COACH', 'ORGANISER'])).toBe(true);
  });
});

describe('canReachClub', () => {
  it('keeps a coach to their own club', () => {
    const coach = { role: 'COACH' as const, clubIds: ['club-a'] };
    expect(canReachClub(coach, 'club-a')).toBe(true);
    expect(canReachClub(coach, 'club-b')).toBe(false);
  });
});
