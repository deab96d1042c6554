import { bevelBand, chiselBand } from '../geometry/index.js';
import { bootstrapMedianInterval, BOOTSTRAP_DEFAULTS, quartiles, type BootstrapOptions } from '../stats/index.js';
import { evidenceLabel, EVIDENCE_THRESHOLDS, type EvidenceLabel } from './evidence-label.js';
import { grindComparisons, type GrindComparison, type WoodTest } from './grind-comparisons.js';
import type { MedianWithInterval, RaceResult } from './insight-types.js';
import { DEFAULT_DIAMETER_EXPONENT, DEFAULT_REFERENCE_MM, type NormaliseOptions } from './normalise-time.js';
import { ratioEffect, type RatioEffect } from './ratio-effect.js';
import { withinAthleteRatios, type AthleteRatio } from './within-athlete-ratios.js';

export interface GrainMatrixOptions extends NormaliseOptions {
  /** Extra dimensions besides species × grind. */
  by?: { bevelBand?: boolean; chiselBand?: boolean; condition?: boolean };
  /** Only results of this event type; median times from different events do not mix. */
  eventType?: string;
  bootstrap?: BootstrapOptions;
}

export interface BandRef {
  id: string;
  label: string;
}

export interface GrainCell {
  source: 'race-times';
  key: string;
  speciesId: string;
  grind: string;
  /** Null when the matrix is not split by that dimension. */
  condition: string | null;
  bevelBand: BandRef | null;
  chiselBand: BandRef | null;
  results: number;
  athletes: number;
  /** Normalised times, in hundredths. */
  time: MedianWithInterval & { q1: number; q3: number };
  /** Within-athlete effect; null when no athlete in the cell has a baseline. */
  effect: RatioEffect | null;
  label: EvidenceLabel;
}

export interface GrainMatrix {
  cells: GrainCell[];
  comparisons: GrindComparison[];
  woods: WoodTest[];
  /** Results left out because no head was linked. */
  skipped: number;
  settings: {
    referenceMm: number;
    exponent: number;
    bootstrap: Required<BootstrapOptions> & { method: 'percentile' };
    thresholds: typeof EVIDENCE_THRESHOLDS;
  };
}

const UNRECORDED_ANGLE: BandRef = { id: 'bevel-unrecorded', label: 'angle not recorded' };
const UNRECORDED_CHISEL: BandRef = { id: 'chisel-unrecorded', label: 'chisel not recorded' };

/**
 * The Grain Map's numbers: results grouped by species × grind (and optionally bevel band,
 * chisel band, condition), each cell with counts, normalised-time median and quartiles, a
 * bootstrap interval, the within-athlete effect and an evidence label; plus rank tests
 * between grinds on the same wood. The output does not depend on the order of `results`.
 */
export function grainMatrix(results: readonly RaceResult[], options: GrainMatrixOptions = {}): GrainMatrix {
  const bootstrap = { ...BOOTSTRAP_DEFAULTS, ...options.bootstrap };
  const inEvent = results.filter((r) => options.eventType === undefined || r.eventType === options.eventType);
  const ratios = new Map(withinAthleteRatios(inEvent, options).map((ratio) => [ratio.resultId, ratio]));
  const withHead = inEvent.filter((r) => r.head !== null);
  const groups = new Map<string, { cell: Omit<GrainCell, 'results' | 'athletes' | 'time' | 'effect' | 'label'>; rows: AthleteRatio[] }>();
  for (const result of withHead) {
    const dims = dimensionsOf(result, options.by ?? {});
    const group = groups.get(dims.key) ?? { cell: dims, rows: [] };
    group.rows.push(ratios.get(result.resultId)!);
    groups.set(dims.key, group);
  }
  const cells = [...groups.values()]
    .map(({ cell, rows }) => completeCell(cell, rows, bootstrap))
    .sort((a, b) => compareText(a.key, b.key));
  const { comparisons, woods } = grindComparisons(
    [...groups.values()].map(({ cell, rows }) => ({ ...cell, rows })),
  );
  return {
    cells,
    comparisons,
    woods,
    skipped: inEvent.length - withHead.length,
    settings: {
      referenceMm: options.referenceMm ?? DEFAULT_REFERENCE_MM,
      exponent: options.exponent ?? DEFAULT_DIAMETER_EXPONENT,
      bootstrap: { ...bootstrap, method: 'percentile' },
      thresholds: EVIDENCE_THRESHOLDS,
    },
  };
}

function dimensionsOf(result: RaceResult, by: NonNullable<GrainMatrixOptions['by']>) {
  const head = result.head!;
  const condition = by.condition ? (result.condition ?? 'unrecorded') : null;
  const bevel = by.bevelBand ? (head.includedDeg === null ? UNRECORDED_ANGLE : pick(bevelBand(head.includedDeg))) : null;
  const chisel = by.chiselBand ? (head.chiselWidthMm === null ? UNRECORDED_CHISEL : pick(chiselBand(head.chiselWidthMm))) : null;
  return {
    source: 'race-times' as const,
    key: JSON.stringify([result.speciesId, condition, head.grind, bevel?.id ?? null, chisel?.id ?? null]),
    speciesId: result.speciesId,
    grind: head.grind,
    condition,
    bevelBand: bevel,
    chiselBand: chisel,
  };
}

function completeCell(
  cell: Omit<GrainCell, 'results' | 'athletes' | 'time' | 'effect' | 'label'>,
  rows: readonly AthleteRatio[],
  bootstrap: Required<BootstrapOptions>,
): GrainCell {
  const times = rows.map((r) => r.normalisedHundredths);
  const { q1, q3 } = quartiles(times);
  const interval = bootstrapMedianInterval(times, bootstrap);
  const effect = ratioEffect(rows, bootstrap);
  const label =
    effect === null
      ? 'not-enough-data'
      : evidenceLabel({ results: effect.results, athletes: effect.athletes, clearDifference: effect.excludesNoDifference });
  return {
    ...cell,
    results: rows.length,
    athletes: new Set(rows.map((r) => r.athleteId)).size,
    time: { median: interval.estimate, low: interval.low, high: interval.high, q1, q3 },
    effect,
    label,
  };
}

function pick(band: BandRef): BandRef {
  return { id: band.id, label: band.label };
}

export function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
