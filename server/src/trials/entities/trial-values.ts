/** Column value types of the trial tables (the GraphQL enums mirror them). */
export type TrialConditionValue = 'GREEN' | 'SEASONED' | 'DRY' | 'PUNKY' | 'FROZEN';
export type KeennessValue = 'DULL' | 'WORKING' | 'KEEN';

export const TRIAL_CONDITIONS: readonly TrialConditionValue[] = ['GREEN', 'SEASONED', 'DRY', 'PUNKY', 'FROZEN'];
export const KEENNESS_VALUES: readonly KeennessValue[] = ['DULL', 'WORKING', 'KEEN'];

/** One swing as stored in `trial_runs.swings`, in millimetres. */
export interface StoredSwing {
  depthMm: number;
  opening: boolean;
}
