import { kruskalWallis, mannWhitney, median, type KruskalWallisResult } from '../stats/index.js';
import { evidenceLabel, EVIDENCE_THRESHOLDS, type EvidenceLabel } from './evidence-label.js';
import type { AthleteRatio } from './within-athlete-ratios.js';

export interface GrindGroupInput {
  speciesId: string;
  condition: string | null;
  grind: string;
  rows: readonly AthleteRatio[];
}

/** Kruskal–Wallis across every grind on one wood (species, plus condition when split by it). */
export interface WoodTest {
  speciesId: string;
  condition: string | null;
  grinds: string[];
  test: KruskalWallisResult | null;
  label: EvidenceLabel;
}

export interface GrindComparison {
  speciesId: string;
  condition: string | null;
  grindA: string;
  grindB: string;
  medianRatioA: number;
  medianRatioB: number;
  resultsA: number;
  resultsB: number;
  athletesA: number;
  athletesB: number;
  pTwoSided: number;
  /** Bonferroni: p × number of pairs on this wood, capped at 1. */
  pAdjusted: number;
  /** The grind that ran faster, only when the adjusted p is below clearMaxP. */
  faster: string | null;
  label: EvidenceLabel;
}

interface GrindSample {
  grind: string;
  ratios: number[];
  athletes: number;
}

/**
 * Rank tests on within-athlete ratios between grinds on the same wood. Each result counts
 * as one observation, so an athlete with many results weighs more; the athlete counts in
 * the labels guard against one athlete carrying a comparison.
 */
export function grindComparisons(groups: readonly GrindGroupInput[]): { comparisons: GrindComparison[]; woods: WoodTest[] } {
  const woods = new Map<string, { speciesId: string; condition: string | null; byGrind: Map<string, AthleteRatio[]> }>();
  for (const group of groups) {
    const key = JSON.stringify([group.speciesId, group.condition]);
    const wood = woods.get(key) ?? { speciesId: group.speciesId, condition: group.condition, byGrind: new Map() };
    wood.byGrind.set(group.grind, [...(wood.byGrind.get(group.grind) ?? []), ...group.rows]);
    woods.set(key, wood);
  }
  const comparisons: GrindComparison[] = [];
  const woodTests: WoodTest[] = [];
  for (const key of [...woods.keys()].sort()) {
    const { speciesId, condition, byGrind } = woods.get(key)!;
    const samples = [...byGrind.keys()].sort().flatMap((grind) => sampleOf(grind, byGrind.get(grind)!));
    woodTests.push(woodTest(speciesId, condition, samples));
    const pairs = (samples.length * (samples.length - 1)) / 2;
    for (let i = 0; i < samples.length; i++) {
      for (let j = i + 1; j < samples.length; j++) {
        comparisons.push(compare(speciesId, condition, samples[i]!, samples[j]!, pairs));
      }
    }
  }
  return { comparisons, woods: woodTests };
}

function sampleOf(grind: string, rows: readonly AthleteRatio[]): GrindSample[] {
  const usable = rows.filter((r) => r.ratio !== null);
  if (usable.length === 0) return [];
  return [{ grind, ratios: usable.map((r) => r.ratio!), athletes: new Set(usable.map((r) => r.athleteId)).size }];
}

function woodTest(speciesId: string, condition: string | null, samples: readonly GrindSample[]): WoodTest {
  const grinds = samples.map((s) => s.grind);
  if (samples.length < 2) return { speciesId, condition, grinds, test: null, label: 'not-enough-data' };
  const test = kruskalWallis(samples.map((s) => s.ratios));
  const label = evidenceLabel({
    results: Math.min(...samples.map((s) => s.ratios.length)),
    athletes: Math.min(...samples.map((s) => s.athletes)),
    clearDifference: test.p < EVIDENCE_THRESHOLDS.clearMaxP,
    p: test.p,
  });
  return { speciesId, condition, grinds, test, label };
}

function compare(speciesId: string, condition: string | null, a: GrindSample, b: GrindSample, pairs: number): GrindComparison {
  const test = mannWhitney(a.ratios, b.ratios);
  const pAdjusted = Math.min(1, test.pTwoSided * pairs);
  const medianRatioA = median(a.ratios);
  const medianRatioB = median(b.ratios);
  const clear = pAdjusted < EVIDENCE_THRESHOLDS.clearMaxP && medianRatioA !== medianRatioB;
  return {
    speciesId,
    condition,
    grindA: a.grind,
    grindB: b.grind,
    medianRatioA,
    medianRatioB,
    resultsA: a.ratios.length,
    resultsB: b.ratios.length,
    athletesA: a.athletes,
    athletesB: b.athletes,
    pTwoSided: test.pTwoSided,
    pAdjusted,
    faster: clear ? (medianRatioA < medianRatioB ? a.grind : b.grind) : null,
    label: evidenceLabel({
      results: Math.min(a.ratios.length, b.ratios.length),
      athletes: Math.min(a.athletes, b.athletes),
      clearDifference: clear,
      p: pAdjusted,
    }),
  };
}
