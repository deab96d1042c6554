import { describe, expect, it } from '@jest/globals';

import { formatDeadline } from './format-deadline.js';

describe('formatDeadline', () => {
  it('prints the deadline in the named time zone with a 24-hour clock', () => {
    // hand-worked: 20:00 UTC on Wed 14 Oct 2026 is 16:00 in New York (EDT, UTC−4, until 1 Nov 2026)
    expect(formatDeadline('2026-10-14T20:00:00Z', 'America/New_York')).toBe('Wed 14 Oct 2026, 16:00');
    expect(formatDeadline('2026-10-14T20:00:00Z', 'UTC')).toBe('Wed 14 Oct 2026, 20:00');
  });

  it('moves to the next day when the zone is ahead of UTC', () => {
    // hand-worked: 20:00 UTC is 09:00 next day in Auckland (NZDT, UTC+13, from 27 Sep 2026)
    expect(formatDeadline('2026-10-14T20:00:00Z', 'Pacific/Auckland')).toBe('Thu 15 Oct 2026, 09:00');
  });
});
