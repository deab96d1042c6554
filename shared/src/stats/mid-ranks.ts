export interface MidRanks {
  /** Rank of each input value, in input order; tied values share the mean of their ranks. */
  ranks: number[];
  /** Sizes of the tie groups (only groups of two or more). */
  tieSizes: number[];
}

/** Ranks 1..n with mid-ranks for ties, as the rank tests need them. */
export function midRanks(values: readonly number[]): MidRanks {
  const order = values.map((value, index) => ({ value, index })).sort((a, b) => a.value - b.value);
  const ranks = new Array<number>(values.length);
  const tieSizes: number[] = [];
  let start = 0;
  while (start < order.length) {
    let end = start;
    while (end + 1 < order.length && order[end + 1]!.value === order[start]!.value) end++;
    const shared = (start + end + 2) / 2;
    for (let k = start; k <= end; k++) ranks[order[k]!.index] = shared;
    if (end > start) tieSizes.push(end - start + 1);
    start = end + 1;
  }
  return { ranks, tieSizes };
}

/** Σ(t³ − t) over tie groups: the tie term both rank tests subtract. */
export function tieTerm(tieSizes: readonly number[]): number {
  return tieSizes.reduce((sum, t) => sum + t * t * t - t, 0);
}
