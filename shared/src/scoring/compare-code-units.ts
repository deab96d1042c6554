/** Code-unit order of two strings: the same on every machine and locale, so output order is stable. */
export function compareCodeUnits(a: string, b: string): number {
  if (a === b) return 0;
  return a < b ? -1 : 1;
}
