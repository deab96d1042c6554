import {
  DEFAULT_REFERENCE_MM,
  describeSpecies,
  fitDiameterExponent,
  grainMatrix,
  speciesById,
  STRENGTH_SOURCE,
  trialEvidence,
  withinAthleteRatios,
  type AthleteRatio,
  type DiameterExponentFit,
  type GrainMatrix,
  type TrialEvidenceCell,
} from '@endgrain/shared';

import type { GrainMapFilter } from './dto/grain-map.filter.js';
import type { RaceRow, TrialRow } from './insights-rows.js';

/** Everything a map request and its drill-downs need, computed once per set of rows. */
export interface GrainComputation {
  eventCode: string;
  rows: RaceRow[];
  ratios: Map<string, AthleteRatio>;
  fit: DiameterExponentFit;
  exponent: number;
  matrix: GrainMatrix;
  trials: TrialRow[];
  trialCells: TrialEvidenceCell[];
}

const GRIND_ORDER = ['flat', 'convex', 'chisel', 'compound'];

/** The shared rules applied to the rows exactly as read: no statistic is computed here. */
export function computeGrainMap(filter: GrainMapFilter, eventCode: string, rows: RaceRow[], trials: TrialRow[]): GrainComputation {
  const fit = fitDiameterExponent(rows);
  const exponent = filter.fittedExponent ? fit.exponent : 2;
  const options = { referenceMm: DEFAULT_REFERENCE_MM, exponent };
  const matrix = grainMatrix(rows, {
    ...options,
    eventType: eventCode,
    by: { bevelBand: !!filter.byBevelBand, chiselBand: !!filter.byChiselBand, condition: !!filter.byCondition },
  });
  const ratios = new Map(withinAthleteRatios(rows, options).map((r) => [r.resultId, r]));
  return { eventCode, rows, ratios, fit, exponent, matrix, trials, trialCells: trialEvidence(trials) };
}

export function grindsOf(matrix: GrainMatrix): string[] {
  const grinds = [...new Set(matrix.cells.map((c) => c.grind))];
  const rank = (g: string) => (GRIND_ORDER.includes(g) ? GRIND_ORDER.indexOf(g) : GRIND_ORDER.length);
  return grinds.sort((a, b) => rank(a) - rank(b) || (a < b ? -1 : 1));
}

export function speciesName(id: string): string {
  return speciesById(id)?.commonName ?? id.replace(/-/g, ' ');
}

/** One line per species on the map, worded by the shared rule so it never outruns its label. */
export function speciesSummaries(computation: GrainComputation, condition: string | null | undefined) {
  const ids = [...new Set(computation.matrix.cells.map((c) => c.speciesId))].sort((a, b) => speciesName(a).localeCompare(speciesName(b)));
  return ids.map((speciesId) => {
    const record = speciesById(speciesId);
    const name = speciesName(speciesId);
    const wood = record === undefined ? name : name.toLowerCase();
    const woodTest = computation.matrix.woods.find((w) => w.speciesId === speciesId && w.condition === null);
    return {
      speciesId,
      name,
      sentence: describeSpecies(computation.matrix, { speciesId, woodLabel: condition ? `${condition} ${wood}` : wood }),
      results: computation.matrix.cells.filter((c) => c.speciesId === speciesId).reduce((sum, c) => sum + c.results, 0),
      specificGravityGreen: record?.specificGravity.green ?? null,
      specificGravityDry: record?.specificGravity.dry12 ?? null,
      hardnessLbfGreen: record?.hardnessLbf.green ?? null,
      hardnessLbfDry: record?.hardnessLbf.dry12 ?? null,
      source: record === undefined ? null : STRENGTH_SOURCE,
      grindsP: woodTest?.test?.p ?? null,
    };
  });
}
