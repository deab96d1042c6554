/** How the block was on the day; the results explorer and the Grain Map filter on it. */
export const BLOCK_CONDITIONS = ['GREEN', 'SEASONED', 'DRY', 'PUNKY', 'FROZEN', 'KNOTTY'] as const;
export type BlockCondition = (typeof BLOCK_CONDITIONS)[number];

export const BLOCK_CONDITION_LABELS: Record<BlockCondition, string> = {
  GREEN: 'Green / wet',
  SEASONED: 'Seasoned',
  DRY: 'Dry',
  PUNKY: 'Punky',
  FROZEN: 'Frozen',
  KNOTTY: 'Knotty',
};
