export { depthPerSwing } from './depth-per-swing.js';
export type { DepthSummary } from './depth-per-swing.js';
export { rankTrialAxes } from './rank-trial-axes.js';
export type { RankedTrialAxe } from './rank-trial-axes.js';
export { recommendationSentence } from './recommendation-sentence.js';
export { summariseTrial } from './summarise-trial.js';
export type { TrialAxeRow } from './summarise-trial.js';
export { testerEffect } from './tester-effect.js';
export type { TesterEffect } from './tester-effect.js';
export { TRIAL_CAUTIONS } from './trial-cautions.js';
export {
  EDGE_KEENNESS,
  headSnapshotSchema,
  RELEASE_SCALE,
  releaseStep,
  trialInputSchema,
  trialRunSchema,
  trialSwingSchema,
} from './trial-types.js';
export type { EdgeKeenness, HeadSnapshot, ReleaseId, ReleaseStep, TrialInput, TrialRun, TrialSwing } from './trial-types.js';
export { TRIAL_MIN_COUNTED_SWINGS, trialVerdict } from './trial-verdict.js';
export type { TrialVerdictRow, VerdictFlag } from './trial-verdict.js';
