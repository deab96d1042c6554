/** "1 Dec 2026, 20:32" in the reader's locale: when a change was made. */
export function formatMoment(iso: string): string {
  return new Date(iso).toLocaleString(undefined, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
}
