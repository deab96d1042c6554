import { RELEASE_SCALE } from '@endgrain/shared';

import type { EdgeKeenness, Grind, TrialCondition, TrialFlag } from '../api/types.js';

export const CONDITIONS: readonly { value: TrialCondition; label: string }[] = [
  { value: 'GREEN', label: 'Green / wet' },
  { value: 'SEASONED', label: 'Seasoned' },
  { value: 'DRY', label: 'Dry' },
  { value: 'PUNKY', label: 'Punky' },
  { value: 'FROZEN', label: 'Frozen' },
];

export const KEENNESS: readonly { value: EdgeKeenness; label: string }[] = [
  { value: 'DULL', label: 'Dull' },
  { value: 'WORKING', label: 'Working' },
  { value: 'KEEN', label: 'Keen' },
];

export const GRIND_WORDS: Record<Grind, string> = { FLAT: 'Flat', CONVEX: 'Convex', CHISEL: 'Chisel', COMPOUND: 'Compound' };

export const FLAG_WORDS: Record<TrialFlag, string> = {
  BINDS: 'Binds',
  PLACED_AFTER_RELEASING_AXES: 'Cut deeper, placed after the axes that release',
  RELEASE_NOT_RECORDED: 'Release not recorded',
  EDGE_DULL: 'Dull edge',
  FEW_SWINGS: 'Few swings',
  NO_COUNTED_SWINGS: 'No counted swings',
};

export function conditionLabel(value: TrialCondition): string {
  return CONDITIONS.find((c) => c.value === value)?.label ?? value;
}

export function keennessLabel(value: EdgeKeenness | null): string {
  return value === null ? 'not judged' : (KEENNESS.find((k) => k.value === value)?.label ?? value);
}

/** "3 · steady" for step 3; the five names are the shared scale's. */
export function releaseLabel(step: number | null): string {
  if (step === null) return 'not judged';
  return RELEASE_SCALE[step - 1]?.label ?? String(step);
}
