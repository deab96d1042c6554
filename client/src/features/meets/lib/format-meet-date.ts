import { formatDay } from './format-day.js';

/**
 * "2026-10-17" → "Sat 17 Oct 2026". A meet date is a calendar day with no time zone, so it is
 * read and printed at UTC and never shifts a day; unreadable text is shown as it came.
 */
export function formatMeetDate(isoDate: string): string {
  const date = new Date(`${isoDate}T00:00:00Z`);
  return Number.isNaN(date.getTime()) ? isoDate : formatDay(date, 'UTC');
}
