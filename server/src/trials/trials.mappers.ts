import { speciesById } from '@endgrain/shared';

import type { TrialSummaryEntity } from './entities/trial-summary.entity.js';
import type { TrialEntity } from './entities/trial.entity.js';
import type { AxeTrialModel } from './models/axe-trial.model.js';
import type { TrialFindingModel, TrialListItemModel, TrialModel, TrialRunModel } from './models/trial.model.js';
import { EdgeKeennessEnum, TrialConditionEnum } from './models/trials.enums.js';
import { computeTrial, frozenWarning, headOf, woodLabel, type TrialComputation } from './trial-mapping.js';

function axeCount(trial: TrialEntity): number {
  return new Set(trial.runs.map((r) => r.axeId)).size;
}

export function toListItem(trial: TrialEntity, computed: TrialComputation, published: boolean): TrialListItemModel {
  const leader = computed.ranking.find((row) => row.verdictPlace === 1);
  return {
    id: trial.id,
    testedOn: trial.testedOn,
    speciesId: trial.speciesId,
    speciesName: speciesById(trial.speciesId)?.commonName ?? trial.speciesId,
    condition: TrialConditionEnum[trial.condition],
    diameterMm: trial.diameterMm,
    referenceAxeLabel: trial.referenceAxe?.label ?? '',
    axeCount: axeCount(trial),
    leaderLabel: leader?.axeLabel ?? null,
    published,
  };
}

export function toFindingModel(s: TrialSummaryEntity): TrialFindingModel {
  return { title: s.title, summary: s.summary, bodyMarkdown: s.bodyMarkdown, fieldNoteId: s.articleId, fieldNoteSlug: s.articleSlug, publishedAt: s.publishedAt };
}

function toRunModel(trial: TrialEntity): TrialRunModel[] {
  const names = new Map(trial.testers.map((t) => [t.id, t.name]));
  return [...trial.runs]
    .sort((a, b) => a.position - b.position)
    .map((r) => ({
      id: r.id,
      axeId: r.axeId,
      axeLabel: r.axe?.label ?? '',
      testerId: r.testerId,
      testerName: names.get(r.testerId) ?? '',
      swings: r.swings.map((s) => ({ depthMm: s.depthMm, opening: Boolean(s.opening) })),
      releaseStep: r.releaseStep,
      keenness: r.keenness === null ? null : EdgeKeennessEnum[r.keenness],
      feel: r.feel,
      notes: r.notes,
      head: headOf(r),
    }));
}

export function toTrialModel(trial: TrialEntity, options: { canEdit: boolean; summary: TrialSummaryEntity | null }): TrialModel {
  const computed = computeTrial(trial);
  return {
    ...toListItem(trial, computed, options.summary !== null),
    clubId: trial.clubId,
    clubName: trial.club?.name ?? '',
    woodLabel: woodLabel(trial.speciesId, trial.condition),
    knots: trial.knots,
    faceUsed: trial.faceUsed,
    airTempC: trial.airTempC,
    frozenWarning: frozenWarning(trial.condition, trial.airTempC),
    referenceAxeId: trial.referenceAxeId,
    notes: trial.notes,
    version: trial.version,
    canEdit: options.canEdit,
    updatedAt: trial.updatedAt,
    testers: [...trial.testers].sort((a, b) => a.position - b.position).map((t) => ({ id: t.id, athleteId: t.athleteId, name: t.name })),
    runs: toRunModel(trial),
    ranking: computed.ranking,
    testerEffects: computed.testerEffects,
    recommendation: computed.recommendation,
    finding: options.summary ? toFindingModel(options.summary) : null,
  };
}

/** One axe's row of a trial's verdict, for the axe's page. */
export function toAxeTrial(trial: TrialEntity, axeId: string): AxeTrialModel {
  const computed = computeTrial(trial);
  const row = computed.ranking.find((r) => r.axeId === axeId);
  return {
    trialId: trial.id,
    testedOn: trial.testedOn,
    speciesId: trial.speciesId,
    condition: TrialConditionEnum[trial.condition],
    woodLabel: woodLabel(trial.speciesId, trial.condition),
    diameterMm: trial.diameterMm,
    axeCount: axeCount(trial),
    isReference: trial.referenceAxeId === axeId,
    verdictPlace: row?.verdictPlace ?? null,
    meanMm: row?.meanMm ?? null,
    ratioToReference: row?.ratioToReference ?? null,
    releaseStep: row?.releaseStep ?? null,
    flags: row?.flags ?? [],
    head: row?.head ?? null,
  };
}
