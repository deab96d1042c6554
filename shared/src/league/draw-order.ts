import { seededRandom } from '../stats/seeded-random.js';

export interface DrawSlot<T> {
  item: T;
  /** 1-based position in the order of competition. */
  order: number;
  /** 1-based heat number. */
  heat: number;
}

/**
 * A reproducible draw: a Fisher–Yates shuffle driven by the stored seed, then heats filled
 * in order. The same seed and the same entries (sorted by id first) give the same draw.
 */
export function drawOrder<T extends { id: string }>(items: readonly T[], seed: number, heatSize: number): DrawSlot<T>[] {
  if (!Number.isInteger(heatSize) || heatSize < 1) throw new RangeError('heat size must be a whole number of at least 1');
  const deck = [...items].sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  const random = seededRandom(seed);
  for (let i = deck.length - 1; i > 0; i -= 1) {
    const j = Math.floor(random() * (i + 1));
    [deck[i], deck[j]] = [deck[j]!, deck[i]!];
  }
  return deck.map((item, i) => ({ item, order: i + 1, heat: Math.floor(i / heatSize) + 1 }));
}
