import { describe, expect, it } from '@jest/globals';

import { formatMeetDate } from './format-meet-date.js';

describe('formatMeetDate', () => {
  it('prints the calendar day with its weekday', () => {
    // hand-worked: 17 October 2026 is a Saturday (1 Jan 2026 is a Thursday; +289 days = 41 weeks + 2)
    expect(formatMeetDate('2026-10-17')).toBe('Sat 17 Oct 2026');
  });

  it('keeps the same day whatever the time zone, because a meet day has none', () => {
    // hand-worked: 1 Jan 2027 is a Friday (2026 has 365 days, Thursday + 1)
    expect(formatMeetDate('2027-01-01')).toBe('Fri 1 Jan 2027');
  });

  it('shows text it cannot read unchanged', () => {
    expect(formatMeetDate('next spring')).toBe('next spring');
  });
});
