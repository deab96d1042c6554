/**
 * Places for items already sorted best first; items that `tie` share a place and the next
 * place skips the ones they cover (1, 1, 3).
 */
export function sharedPlaces<T>(sorted: readonly T[], tie: (a: T, b: T) => boolean): number[] {
  const places: number[] = [];
  sorted.forEach((item, index) => {
    const previous = sorted[index - 1];
    places.push(previous !== undefined && tie(previous, item) ? places[index - 1]! : index + 1);
  });
  return places;
}

/** Trial depths are compared at 0.1 mm, finer than any tester reads a cut. */
export function sameDepth(a: number | null, b: number | null): boolean {
  if (a === null || b === null) return a === b;
  return Math.round(a * 10) === Math.round(b * 10);
}
