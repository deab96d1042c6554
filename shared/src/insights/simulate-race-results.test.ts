import { describe, expect, it } from '@jest/globals';

import { simulateRaceResults } from './simulate-race-results.js';

describe('simulateRaceResults', () => {
  const spec = { seed: 3, speciesId: 'red-alder', athletes: 3, resultsPerAthletePerGrind: 4, grinds: { chisel: 0.9, flat: 1 }, noise: 0, diametersMm: [300, 330] };

  it('makes every athlete cut every grind the stated number of times, repeatably', () => {
    // Construction: 3 athletes × 2 grinds × 4 results = 24; same seed → same data.
    const results = simulateRaceResults(spec);
    expect(results).toHaveLength(24);
    expect(simulateRaceResults(spec)).toEqual(results);
    expect(new Set(results.map((r) => r.resultId)).size).toBe(24);
  });

  it('applies the grind multiplier and area scaling without noise', () => {
    // Construction: same athlete and diameter, chisel/flat = 0.9 (to the rounding of whole hundredths);
    // 330 mm vs 300 mm scales by (330/300)² = 1.21.
    const results = simulateRaceResults(spec);
    const time = (grind: string, k: number) => results.find((r) => r.resultId === `red-alder-${grind}-a0-r${k}`)!.hundredths;
    expect(time('chisel', 0) / time('flat', 0)).toBeCloseTo(0.9, 3);
    expect(time('flat', 1) / time('flat', 0)).toBeCloseTo(1.21, 3);
  });
});
