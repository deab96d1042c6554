import {
  recommendationSentence,
  speciesById,
  summariseTrial,
  testerEffect,
  trialInputSchema,
  trialVerdict,
  type EdgeKeenness,
  type ReleaseId,
  type TrialInput,
  type TrialVerdictRow,
  type VerdictFlag,
} from '@endgrain/shared';

import type { TrialRunEntity } from './entities/trial-run.entity.js';
import type { TrialEntity } from './entities/trial.entity.js';
import type { KeennessValue, TrialConditionValue } from './entities/trial-values.js';
import type { TrialHeadModel } from './models/trial-head.model.js';
import type { TrialRankingRowModel, TrialTesterEffectModel } from './models/trial-ranking.model.js';
import { EdgeKeennessEnum, TrialFlagEnum } from './models/trials.enums.js';
import { GrindEnum } from '../rack/models/rack.enums.js';

/** A trial with its testers and runs (each run with its axe) loaded. */
export type LoadedTrial = Pick<TrialEntity, 'id' | 'speciesId' | 'condition' | 'diameterMm' | 'referenceAxeId' | 'testers' | 'runs'>;

const CONDITION_WORDS: Record<TrialConditionValue, string> = { GREEN: 'green', SEASONED: 'seasoned', DRY: 'dry', PUNKY: 'punky', FROZEN: 'frozen' };

const FLAGS: Record<VerdictFlag, TrialFlagEnum> = {
  binds: TrialFlagEnum.BINDS,
  'placed-after-releasing-axes': TrialFlagEnum.PLACED_AFTER_RELEASING_AXES,
  'release-not-recorded': TrialFlagEnum.RELEASE_NOT_RECORDED,
  'edge-dull': TrialFlagEnum.EDGE_DULL,
  'few-swings': TrialFlagEnum.FEW_SWINGS,
  'no-counted-swings': TrialFlagEnum.NO_COUNTED_SWINGS,
};

/** "green quaking aspen": the block as people say it, for the recommendation sentence. */
export function woodLabel(speciesId: string, condition: TrialConditionValue): string {
  return `${CONDITION_WORDS[condition]} ${speciesById(speciesId)?.commonName ?? speciesId}`;
}

/** Frozen wood chips and cracks an edge: warn on a frozen block or air at or below 0 °C. */
export function frozenWarning(condition: TrialConditionValue, airTempC: number | null): boolean {
  return condition === 'FROZEN' || (airTempC !== null && airTempC <= 0);
}

export function releaseId(step: number): ReleaseId {
  return `release-${step}` as ReleaseId;
}

export function releaseStepOf(id: ReleaseId | null): number | null {
  return id === null ? null : Number(id.slice('release-'.length));
}

function keenness(value: KeennessValue | null): EdgeKeenness | null {
  return value === null ? null : (value.toLowerCase() as EdgeKeenness);
}

export function headOf(run: Pick<TrialRunEntity, 'grind' | 'bevelIncludedDeg' | 'chiselWidthMm'>): TrialHeadModel {
  return { grind: GrindEnum[run.grind], bevelIncludedDeg: run.bevelIncludedDeg, chiselWidthMm: run.chiselWidthMm };
}

/** The stored trial as the shared computation reads it (runs in recorded order). */
export function toTrialInput(trial: LoadedTrial): TrialInput {
  const testers = new Map(trial.testers.map((t) => [t.id, t.name]));
  const runs = [...trial.runs].sort((a, b) => a.position - b.position);
  return trialInputSchema.parse({
    trialId: trial.id,
    speciesId: trial.speciesId,
    condition: trial.condition,
    diameterMm: trial.diameterMm,
    referenceAxeId: trial.referenceAxeId,
    runs: runs.map((run) => ({
      axeId: run.axeId,
      axeLabel: run.axe.label,
      testerId: run.testerId,
      testerName: testers.get(run.testerId) ?? 'Unknown tester',
      swings: run.swings.map((s) => (s.opening ? { depthMm: s.depthMm, opening: true } : { depthMm: s.depthMm })),
      release: run.releaseStep === null ? null : releaseId(run.releaseStep),
      keenness: keenness(run.keenness),
      head: { grind: run.grind, includedDeg: run.bevelIncludedDeg, chiselWidthMm: run.chiselWidthMm },
    })),
  });
}

export interface TrialComputation {
  verdict: TrialVerdictRow[];
  ranking: TrialRankingRowModel[];
  testerEffects: TrialTesterEffectModel[];
  recommendation: string;
}

/** Verdict, tester effects and the recommendation sentence, mapped for GraphQL. Empty trials give empty rows. */
export function computeTrial(trial: LoadedTrial): TrialComputation {
  if (trial.runs.length === 0) {
    return { verdict: [], ranking: [], testerEffects: [], recommendation: `For ${woodLabel(trial.speciesId, trial.condition)}: no axe has been swung yet.` };
  }
  const input = toTrialInput(trial);
  const verdict = trialVerdict(summariseTrial(input));
  return {
    verdict,
    ranking: verdict.map(toRankingRow),
    testerEffects: testerEffect(input).map((e) => ({
      axeId: e.axeId,
      axeLabel: e.axeLabel,
      byTester: e.byTester,
      highToLowRatio: Number.isFinite(e.highToLowRatio) ? e.highToLowRatio : null,
    })),
    recommendation: recommendationSentence(verdict, woodLabel(trial.speciesId, trial.condition)),
  };
}

export function toRankingRow(row: TrialVerdictRow): TrialRankingRowModel {
  return {
    axeId: row.axeId,
    axeLabel: row.axeLabel,
    isReference: row.isReference,
    head: row.head === null ? null : { grind: GrindEnum[row.head.grind as keyof typeof GrindEnum], bevelIncludedDeg: row.head.includedDeg, chiselWidthMm: row.head.chiselWidthMm },
    testers: row.testers,
    counted: row.depth.counted,
    openingExcluded: row.depth.openingExcluded,
    meanMm: row.depth.meanMm,
    sdMm: row.depth.sdMm,
    ratioToReference: row.ratioToReference,
    sameTesterRatio: row.sameTesterRatio,
    testersWithoutReference: row.testersWithoutReference,
    releaseStep: releaseStepOf(row.release),
    keenness: row.keenness === null ? null : EdgeKeennessEnum[row.keenness.toUpperCase() as KeennessValue],
    depthPlace: row.depthPlace,
    verdictPlace: row.verdictPlace,
    flags: row.flags.map((f) => FLAGS[f]),
    notes: row.notes,
  };
}
