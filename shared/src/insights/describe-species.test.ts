import { describe, expect, it } from '@jest/globals';

import { describeSpecies } from './describe-species.js';
import { grainMatrix } from './grain-matrix.js';
import { EXAMPLE_SIMULATION as BASE, simulateRaceResults } from './simulate-race-results.js';
const options = { speciesId: 'quaking-aspen', woodLabel: 'green quaking aspen' };

describe('describeSpecies', () => {
  it('states a clear, well-supported effect as faster, with its counts and label', () => {
    // Construction: chisel is 6 % faster than convex, so about 3 % faster than each athlete's usual.
    const sentence = describeSpecies(grainMatrix(simulateRaceResults(BASE), { by: { bevelBand: true } }), options);
    expect(sentence).toMatch(
      /^On green quaking aspen, chisel grinds at 14–16° ran [2-4] % faster than the same athletes' usual times \(n = 40 results, 8 athletes; strong\)\.$/,
    );
  });

  it('uses the display name given for a grind', () => {
    const sentence = describeSpecies(grainMatrix(simulateRaceResults(BASE)), { ...options, grindLabel: (g) => g.toUpperCase() });
    expect(sentence).toMatch(/^On green quaking aspen, CHISEL grinds ran/);
  });

  it('claims no difference when the interval includes none', () => {
    // Construction: both grinds the same pace, large noise → no clear difference; 12 results ≥ 10, 4 athletes ≥ 3.
    const matrix = grainMatrix(
      simulateRaceResults({ ...BASE, athletes: 4, resultsPerAthletePerGrind: 3, grinds: { chisel: 1, convex: 1 }, noise: 0.3 }),
    );
    const sentence = describeSpecies(matrix, options);
    expect(sentence).toMatch(/showed no clear difference from the same athletes' usual times \(n = 12 results, 4 athletes; suggestive\)\.$/);
    expect(sentence).not.toMatch(/faster|slower|strong/);
  });

  it('says "not enough data yet" below the thresholds', () => {
    // Threshold: 2 athletes < 3 → every cell is not-enough-data.
    const matrix = grainMatrix(simulateRaceResults({ ...BASE, athletes: 2 }));
    expect(describeSpecies(matrix, options)).toBe(
      'On green quaking aspen, not enough data yet to compare head setups (20 results so far).',
    );
  });
});
