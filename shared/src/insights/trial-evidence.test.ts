import { describe, expect, it } from '@jest/globals';

import type { TrialInput } from '../trials/index.js';
import { trialEvidence } from './trial-evidence.js';

/** Invented trial: reference axe cuts 30 mm a swing; the test axe cuts `depth`. */
function trial(index: number, depth: number, grind = 'chisel'): TrialInput {
  const head = { grind, includedDeg: 15, chiselWidthMm: 19 };
  return {
    speciesId: 'quaking-aspen',
    condition: 'green',
    diameterMm: 300,
    referenceAxeId: 'ref',
    runs: [
      { axeId: 'ref', axeLabel: 'Reference', testerId: 'ana', swings: [{ depthMm: 30 }, { depthMm: 30 }], release: 'release-3', keenness: 'keen', head: { ...head, grind: 'convex' } },
      { axeId: `axe-${index}`, axeLabel: `Axe ${index}`, testerId: 'ana', swings: [{ depthMm: depth }, { depthMm: depth }], release: 'release-4', keenness: 'keen', head },
    ],
  };
}

describe('trialEvidence', () => {
  it('pools ratios to the reference by species, condition and grind, apart from race evidence', () => {
    // Hand-worked: depths 33, 36, 39 against 30 → ratios 1.1, 1.2, 1.3 → median 1.2; 3 trials, 3 rows.
    const [cell, ...rest] = trialEvidence([trial(1, 33), trial(2, 36), trial(3, 39)], { resamples: 200 });
    expect(rest).toEqual([]);
    expect(cell).toMatchObject({ source: 'trials', grind: 'chisel', axeRows: 3, trials: 3 });
    expect(cell!.ratio.median).toBeCloseTo(1.2, 12);
    // Threshold: fewer than 4 axe rows → not-enough-data.
    expect(cell!.label).toBe('not-enough-data');
  });

  it('labels many consistent trials strong and leaves the reference axe out', () => {
    // Threshold: ≥ 10 rows from ≥ 5 trials with an interval above 1; every ratio here is 1.1–1.2.
    const trials = Array.from({ length: 10 }, (_, i) => trial(i, 33 + (i % 4)));
    const cells = trialEvidence(trials, { resamples: 200 });
    expect(cells.map((c) => [c.grind, c.axeRows, c.label])).toEqual([['chisel', 10, 'strong']]);
  });
});
