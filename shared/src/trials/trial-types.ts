import { z } from 'zod';

/**
 * How freely the bit comes out of the cut, from binding to springing free. The five labels
 * are Endgrain's own; steps 1–2 count as binding and 4–5 as free in every verdict.
 */
export const RELEASE_SCALE = [
  { id: 'release-1', step: 1, label: 'holds fast', binds: true, free: false },
  { id: 'release-2', step: 2, label: 'drags', binds: true, free: false },
  { id: 'release-3', step: 3, label: 'steady', binds: false, free: false },
  { id: 'release-4', step: 4, label: 'clean', binds: false, free: true },
  { id: 'release-5', step: 5, label: 'springs out', binds: false, free: true },
] as const;

export type ReleaseId = (typeof RELEASE_SCALE)[number]['id'];
export type ReleaseStep = (typeof RELEASE_SCALE)[number];

/** Edge keenness as the tester judged it, worst first. */
export const EDGE_KEENNESS = ['dull', 'working', 'keen'] as const;
export type EdgeKeenness = (typeof EDGE_KEENNESS)[number];

const releaseIds = RELEASE_SCALE.map((step) => step.id) as [ReleaseId, ...ReleaseId[]];

export const trialSwingSchema = z.object({
  depthMm: z.number().nonnegative().max(400),
  /** Opening strokes set up the cut and are left out of every figure. */
  opening: z.boolean().optional(),
});

export const headSnapshotSchema = z.object({
  grind: z.string().min(1),
  includedDeg: z.number().positive().lt(180).nullable(),
  chiselWidthMm: z.number().nonnegative().nullable(),
});

export const trialRunSchema = z.object({
  axeId: z.string().min(1),
  axeLabel: z.string().min(1),
  testerId: z.string().min(1),
  testerName: z.string().min(1).optional(),
  swings: z.array(trialSwingSchema),
  release: z.enum(releaseIds).nullable(),
  keenness: z.enum(EDGE_KEENNESS).nullable(),
  head: headSnapshotSchema.optional(),
});

export const trialInputSchema = z.object({
  trialId: z.string().min(1).optional(),
  speciesId: z.string().min(1),
  condition: z.string().min(1),
  diameterMm: z.number().positive(),
  referenceAxeId: z.string().min(1),
  runs: z.array(trialRunSchema).min(1),
});

export type TrialSwing = z.infer<typeof trialSwingSchema>;
export type HeadSnapshot = z.infer<typeof headSnapshotSchema>;
export type TrialRun = z.infer<typeof trialRunSchema>;
export type TrialInput = z.infer<typeof trialInputSchema>;

export function releaseStep(id: ReleaseId): ReleaseStep {
  return RELEASE_SCALE.find((step) => step.id === id) as ReleaseStep;
}
