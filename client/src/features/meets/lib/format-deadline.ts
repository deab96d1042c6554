import { formatDay } from './format-day.js';

/**
 * An entry deadline in the reader's own clock: "Wed 14 Oct 2026, 21:00". The zone can be named,
 * so tests do not depend on the machine's.
 */
export function formatDeadline(isoDateTime: string, timeZone?: string): string {
  const date = new Date(isoDateTime);
  if (Number.isNaN(date.getTime())) return isoDateTime;
  const time = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone });
  return `${formatDay(date, timeZone)}, ${time.format(date)}`;
}
