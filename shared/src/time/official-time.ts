export interface OfficialTime {
  /** The time that ranks, in hundredths. */
  official: number;
  /** The raw watch times that made it, in the order given. */
  used: number[];
  /** The raw time left out (three watches only), or null. */
  dropped: number | null;
}

/**
 * The official time from one to three stopwatches, all in hundredths.
 * - One watch: its time.
 * - Two: their mean.
 * - Three: the time furthest from the median (the middle time, which is always kept) is
 *   dropped and the other two averaged. When the fastest and slowest are equally far from
 *   the median, the fastest is dropped.
 * A mean that falls on half a hundredth rounds up to the next hundredth.
 * Both choices follow one rule: where the watches leave doubt, the slower reading stands, so
 * an official time never claims more speed than the watches agree on.
 */
export function officialTime(rawHundredths: readonly number[]): OfficialTime {
  if (rawHundredths.length < 1 || rawHundredths.length > 3) {
    throw new RangeError(`an official time needs one to three watch times, got ${rawHundredths.length}`);
  }
  for (const raw of rawHundredths) {
    if (!Number.isSafeInteger(raw) || raw < 0) {
      throw new RangeError(`a watch time is a whole, non-negative number of hundredths, got ${raw}`);
    }
  }
  const dropIndex = rawHundredths.length === 3 ? furthestFromMedian(rawHundredths) : -1;
  const used = rawHundredths.filter((_, index) => index !== dropIndex);
  const sum = used.reduce((total, raw) => total + raw, 0);
  // Integer ceiling of the mean: exact for one watch, and rounds a .5 mean up for two.
  return {
    official: Math.ceil(sum / used.length),
    used,
    dropped: dropIndex === -1 ? null : (rawHundredths[dropIndex] ?? null),
  };
}

function furthestFromMedian(times: readonly number[]): number {
  const order = [0, 1, 2].sort((a, b) => (times[a] ?? 0) - (times[b] ?? 0));
  const [fastest = 0, middle = 1, slowest = 2] = order;
  const time = (index: number): number => times[index] ?? 0;
  const below = time(middle) - time(fastest);
  const above = time(slowest) - time(middle);
  // Strict `>`: on an even split the fastest goes (see the rule above).
  return above > below ? slowest : fastest;
}
