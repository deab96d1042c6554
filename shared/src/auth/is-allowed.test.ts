import { describe, expect, it } from '@jest/globals';

import { canManageClub, canReachClub, isAllowed } from './is-allowed.js';

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

describe('canManageClub', () => {
  it('lets a coach manage their own club but not another', () => {
    const coach = { role: 'COACH' as const, clubIds: ['club-a'] };
    expect(canManageClub(coach, 'club-a')).toBe(true);
    expect(canManageClub(coach, 'club-b')).toBe(false);
  });

  it('does not let an athlete manage their own club', () => {
    expect(canManageClub({ role: 'ATHLETE', clubIds: ['club-a'] }, 'club-a')).toBe(false);
  });
});
