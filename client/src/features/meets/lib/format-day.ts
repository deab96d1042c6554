/** "Sat 17 Oct 2026" for an instant in a time zone (the machine's when none is named). */
export function formatDay(date: Date, timeZone?: string): string {
  const parts = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', timeZone })
    .formatToParts(date)
    .filter((part) => part.type !== 'literal');
  const get = (type: Intl.DateTimeFormatPartTypes) => parts.find((part) => part.type === type)?.value ?? '';
  // Built from parts: the locale's own punctuation ("Sat, 17 Oct") varies between ICU versions.
  return `${get('weekday')} ${get('day')} ${get('month')} ${get('year')}`;
}
