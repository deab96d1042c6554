export interface Placed<T> {
  item: T;
  place: number;
  tied: boolean;
}

/**
 * Competition places for ordered tie groups: a group shares the place after everyone
 * ahead of it, so two tied for 1st are followed by 3rd.
 */
export function placeGroups<T>(groups: readonly (readonly T[])[], firstPlace = 1): Placed<T>[] {
  const placed: Placed<T>[] = [];
  for (const group of groups) {
    const place = firstPlace + placed.length;
    for (const item of group) placed.push({ item, place, tied: group.length > 1 });
  }
  return placed;
}
