/** Splits a sorted list into runs of neighbours that `same` calls equal. */
export function groupTies<T>(sorted: readonly T[], same: (a: T, b: T) => boolean): T[][] {
  const groups: T[][] = [];
  for (const item of sorted) {
    const last = groups.at(-1);
    const previous = last?.at(-1);
    if (last && previous !== undefined && same(previous, item)) last.push(item);
    else groups.push([item]);
  }
  return groups;
}
