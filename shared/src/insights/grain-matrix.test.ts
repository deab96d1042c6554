import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import { EVIDENCE_THRESHOLDS } from './evidence-label.js';
import { grainMatrix } from './grain-matrix.js';
import type { RaceResult } from './insight-types.js';
import { EXAMPLE_SIMULATION, simulateRaceResults } from './simulate-race-results.js';

const result = (resultId: string, athleteId: string, grind: string, hundredths: number): RaceResult => ({
  resultId,
  athleteId,
  eventType: 'underhand-chop',
  speciesId: 'quaking-aspen',
  condition: 'green',
  diameterMm: 300,
  hundredths,
  head: { grind, includedDeg: 15, chiselWidthMm: 19 },
});

// Invented: Ana 3000, 3000 (chisel) and 3300, 3300 (convex); Ben 4000 (chisel), 4400 (convex).
const SMALL = [
  result('r1', 'ana', 'chisel', 3000),
  result('r2', 'ana', 'chisel', 3000),
  result('r3', 'ana', 'convex', 3300),
  result('r4', 'ana', 'convex', 3300),
  result('r5', 'ben', 'chisel', 4000),
  result('r6', 'ben', 'convex', 4400),
];

const FAST = { resamples: 200 };

describe('grainMatrix on a hand-worked case', () => {
  const matrix = grainMatrix(SMALL, { bootstrap: FAST });
  const chisel = matrix.cells.find((c) => c.grind === 'chisel')!;

  it('counts, medians and quartiles each cell', () => {
    // Hand-worked: chisel times 3000, 3000, 4000 → median 3000; type-7 q1 = 3000, q3 at 1.5 → 3500.
    expect(chisel).toMatchObject({ results: 3, athletes: 2, source: 'race-times' });
    expect(chisel.time).toMatchObject({ median: 3000, q1: 3000, q3: 3500 });
  });

  it('measures the within-athlete effect but will not label three results', () => {
    // Hand-worked: Ana's median 3150 → 3000/3150 = 20/21; Ben's 4200 → 4000/4200 = 20/21.
    expect(chisel.effect!.median).toBeCloseTo(20 / 21, 12);
    // Threshold: fewer than 10 results → not-enough-data.
    expect(chisel.label).toBe('not-enough-data');
  });

  it('tests the grinds against each other with tie-corrected rank tests', () => {
    // Hand-worked Mann–Whitney: chisel ratios all 20/21 (3 tied), convex all 22/21 (3 tied); U = 0.
    // Var = (9/12)·(7 − 48/30) = 4.05; z = (0 − 4.5 + 0.5)/2.012461 = −1.987616 → p two-sided 0.046854.
    const [pair] = matrix.comparisons;
    expect(pair).toMatchObject({ grindA: 'chisel', grindB: 'convex', faster: 'chisel', label: 'not-enough-data' });
    expect(pair!.pTwoSided).toBeCloseTo(0.046854, 6);
    // Hand-worked Kruskal–Wallis: R = 6, 15; raw H = (12/42)(12 + 75) − 21 = 3.857143; C = 1 − 48/210;
    // H = 5.0; p = P(χ²₁ ≥ 5) = 0.025347.
    expect(matrix.woods[0]!.test!.h).toBeCloseTo(5, 10);
    expect(matrix.woods[0]!.test!.p).toBeCloseTo(0.025347, 6);
  });

  it('states its settings and skips results with no head linked', () => {
    const withLoose = grainMatrix([...SMALL, { ...result('r7', 'cal', 'chisel', 3900), head: null }], { bootstrap: FAST });
    expect(withLoose.skipped).toBe(1);
    expect(withLoose.settings).toMatchObject({ referenceMm: 300, exponent: 2, bootstrap: { resamples: 200, method: 'percentile' } });
  });

  it('splits by bevel band when asked', () => {
    const split = grainMatrix([...SMALL, { ...result('r8', 'ben', 'chisel', 4100), head: { grind: 'chisel', includedDeg: 17, chiselWidthMm: null } }], {
      by: { bevelBand: true },
      bootstrap: FAST,
    });
    expect(split.cells.filter((c) => c.grind === 'chisel').map((c) => c.bevelBand!.label)).toEqual(['14–16°', '16–18°']);
  });
});

describe('grainMatrix on simulated league data', () => {
  // Invented league: 8 athletes × 5 results per grind; chisel 6 % faster than convex, ±2 % noise.
  const results = simulateRaceResults({ ...EXAMPLE_SIMULATION, diametersMm: [275, 300, 325] });
  const matrix = grainMatrix(results);

  it('labels a large, clear effect strong and says which grind is faster', () => {
    const chisel = matrix.cells.find((c) => c.grind === 'chisel')!;
    // Construction: chisel/own-median ≈ 0.94/0.97 ≈ 0.969; 40 results, 8 athletes ≥ 30 and 6.
    expect(chisel.effect!.median).toBeGreaterThan(0.95);
    expect(chisel.effect!.median).toBeLessThan(0.99);
    expect(chisel.label).toBe('strong');
    expect(matrix.comparisons[0]).toMatchObject({ faster: 'chisel', label: 'strong' });
  });
});

const arbitraryResults = fc
  .array(
    fc.record({
      athlete: fc.integer({ min: 0, max: 7 }),
      species: fc.constantFrom('quaking-aspen', 'eastern-white-pine'),
      grind: fc.constantFrom('chisel', 'convex', 'flat'),
      hundredths: fc.integer({ min: 1500, max: 9000 }),
      diameterMm: fc.constantFrom(275, 300, 325),
      includedDeg: fc.double({ min: 12, max: 20, noNaN: true }),
    }),
    { maxLength: 60 },
  )
  .map((rows) =>
    rows.map((r, i): RaceResult => ({
      resultId: `r${i}`,
      athleteId: `athlete-${r.athlete}`,
      eventType: 'underhand-chop',
      speciesId: r.species,
      condition: 'green',
      diameterMm: r.diameterMm,
      hundredths: r.hundredths,
      head: { grind: r.grind, includedDeg: r.includedDeg, chiselWidthMm: 19 },
    })),
  );

describe('grainMatrix properties', () => {
  it('never labels a cell or comparison below the thresholds strong', () => {
    const t = EVIDENCE_THRESHOLDS;
    fc.assert(
      fc.property(arbitraryResults, (results) => {
        const matrix = grainMatrix(results, { bootstrap: { resamples: 50 } });
        const cellsOk = matrix.cells.every((c) => {
          const n = c.effect?.results ?? 0;
          const athletes = c.effect?.athletes ?? 0;
          if (n < t.minResults || athletes < t.minAthletes) return c.label === 'not-enough-data';
          return c.label !== 'strong' || (n >= t.strongMinResults && athletes >= t.strongMinAthletes && c.effect!.excludesNoDifference);
        });
        const pairsOk = matrix.comparisons.every((p) => {
          const n = Math.min(p.resultsA, p.resultsB);
          const athletes = Math.min(p.athletesA, p.athletesB);
          if (n < t.minResults || athletes < t.minAthletes) return p.label === 'not-enough-data';
          return p.label !== 'strong' || (n >= t.strongMinResults && p.pAdjusted < t.strongMaxP);
        });
        return cellsOk && pairsOk;
      }),
      { numRuns: 60 },
    );
  });

  it('does not change when the results are shuffled', () => {
    fc.assert(
      fc.property(
        arbitraryResults.chain((results) =>
          fc.tuple(fc.constant(results), fc.shuffledSubarray(results, { minLength: results.length, maxLength: results.length })),
        ),
        ([results, shuffled]) => {
          const options = { by: { bevelBand: true }, bootstrap: { resamples: 50 } };
          expect(grainMatrix(shuffled, options)).toEqual(grainMatrix(results, options));
        },
      ),
      { numRuns: 40 },
    );
  });
});
