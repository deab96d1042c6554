/** Grind profiles a result's head snapshot records (the Rack uses the same four). */
export const HEAD_GRINDS = ['FLAT', 'CONVEX', 'CHISEL', 'COMPOUND'] as const;
export type HeadGrind = (typeof HEAD_GRINDS)[number];

export const HEAD_GRIND_LABELS: Record<HeadGrind, string> = {
  FLAT: 'Flat',
  CONVEX: 'Convex',
  CHISEL: 'Chisel',
  COMPOUND: 'Compound',
};
