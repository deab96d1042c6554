import { formatCsv, type GrainCell, type GrainMatrix, type TrialEvidenceCell } from '@endgrain/shared';

import type { GrainCellModel, GrainSettingsModel, TrialCellModel } from './models/grain-map.model.js';
import type { GrainComputation } from './grain-map-compute.js';
import { speciesName } from './grain-map-compute.js';

export function toCellModel(cell: GrainCell): GrainCellModel {
  return {
    key: cell.key,
    speciesId: cell.speciesId,
    grind: cell.grind,
    condition: cell.condition,
    bevelBand: cell.bevelBand?.id ?? null,
    bevelBandLabel: cell.bevelBand?.label ?? null,
    chiselBand: cell.chiselBand?.id ?? null,
    chiselBandLabel: cell.chiselBand?.label ?? null,
    results: cell.results,
    athletes: cell.athletes,
    medianHundredths: cell.time.median,
    lowHundredths: cell.time.low,
    highHundredths: cell.time.high,
    q1Hundredths: cell.time.q1,
    q3Hundredths: cell.time.q3,
    effect: cell.effect?.median ?? null,
    effectLow: cell.effect?.low ?? null,
    effectHigh: cell.effect?.high ?? null,
    effectResults: cell.effect?.results ?? 0,
    effectAthletes: cell.effect?.athletes ?? 0,
    clearDifference: cell.effect?.excludesNoDifference ?? false,
    label: cell.label,
  };
}

export function toTrialCellModel(cell: TrialEvidenceCell): TrialCellModel {
  return {
    key: cell.key,
    speciesId: cell.speciesId,
    condition: cell.condition,
    grind: cell.grind,
    axeRows: cell.axeRows,
    trials: cell.trials,
    ratio: cell.ratio.median,
    ratioLow: cell.ratio.low,
    ratioHigh: cell.ratio.high,
    label: cell.label,
  };
}

export function toSettingsModel(c: GrainComputation): GrainSettingsModel {
  const s: GrainMatrix['settings'] = c.matrix.settings;
  const fitted = c.exponent === c.fit.exponent && c.fit.source === 'fitted';
  return {
    referenceMm: s.referenceMm,
    exponent: s.exponent,
    exponentSource: fitted ? 'fitted' : 'default',
    exponentLow: c.fit.low,
    exponentHigh: c.fit.high,
    exponentResults: c.fit.results,
    exponentAthletes: c.fit.athletes,
    exponentNote: c.fit.note,
    resamples: s.bootstrap.resamples,
    seed: s.bootstrap.seed,
    level: s.bootstrap.level,
    ...s.thresholds,
  };
}

const round = (value: number | null, places: number) => (value === null ? null : Number(value.toFixed(places)));

/** The matrix as a sheet: one row per cell, times in seconds, effect as a ratio. */
export function grainMapCsv(c: GrainComputation): string {
  const header = [
    'species', 'grind', 'condition', 'bevel band', 'chisel band', 'results', 'athletes',
    'median normalised seconds', 'median low', 'median high', 'q1 seconds', 'q3 seconds',
    'effect ratio', 'effect low', 'effect high', 'evidence', 'reference mm', 'exponent',
  ];
  const rows = c.matrix.cells.map((cell) => [
    speciesName(cell.speciesId), cell.grind, cell.condition, cell.bevelBand?.label ?? null, cell.chiselBand?.label ?? null,
    cell.results, cell.athletes,
    round(cell.time.median / 100, 2), round(cell.time.low / 100, 2), round(cell.time.high / 100, 2),
    round(cell.time.q1 / 100, 2), round(cell.time.q3 / 100, 2),
    round(cell.effect?.median ?? null, 4), round(cell.effect?.low ?? null, 4), round(cell.effect?.high ?? null, 4),
    cell.label, c.matrix.settings.referenceMm, round(c.matrix.settings.exponent, 4),
  ]);
  return formatCsv([header, ...rows]);
}
