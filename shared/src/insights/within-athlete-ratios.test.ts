import { describe, expect, it } from '@jest/globals';

import type { RaceResult } from './insight-types.js';
import { ratioEffect } from './ratio-effect.js';
import { withinAthleteRatios } from './within-athlete-ratios.js';

const result = (resultId: string, athleteId: string, hundredths: number, diameterMm = 300): RaceResult => ({
  resultId,
  athleteId,
  eventType: 'standing-block-chop',
  speciesId: 'quaking-aspen',
  condition: 'green',
  diameterMm,
  hundredths,
  head: { grind: 'chisel', includedDeg: 15, chiselWidthMm: 19 },
});

describe('withinAthleteRatios', () => {
  it('divides each time by the athlete’s median on that event and species', () => {
    // Hand-worked: Ana 3000, 3300, 3600 → median 3300 → ratios 0.909091, 1, 1.090909.
    const ratios = withinAthleteRatios([result('r1', 'ana', 3000), result('r2', 'ana', 3300), result('r3', 'ana', 3600)]);
    expect(ratios.map((r) => r.ratio)).toEqual([3000 / 3300, 1, 3600 / 3300]);
    expect(ratios[0]!.baselineCount).toBe(3);
  });

  it('normalises block size before comparing', () => {
    // Hand-worked: 4900 on 350 mm → 4900 × (300/350)² = 3600; with 3600 on 300 mm both ratios are 1.
    const ratios = withinAthleteRatios([result('r1', 'ben', 4900, 350), result('r2', 'ben', 3600)]);
    expect(ratios[0]!.normalisedHundredths).toBeCloseTo(3600, 9);
    for (const r of ratios) expect(r.ratio).toBeCloseTo(1, 12);
  });

  it('gives no ratio for an athlete’s only result there', () => {
    const [only] = withinAthleteRatios([result('r1', 'cal', 4000)]);
    expect(only!.ratio).toBeNull();
  });
});

describe('ratioEffect', () => {
  it('takes the median ratio with a bootstrap interval and counts athletes', () => {
    // Hand-worked: Ana 0.909, 1, 1.091 and Ben 1, 1 → median of five ratios = 1; two athletes.
    const ratios = withinAthleteRatios([
      result('r1', 'ana', 3000),
      result('r2', 'ana', 3300),
      result('r3', 'ana', 3600),
      result('r4', 'ben', 4900, 350),
      result('r5', 'ben', 3600),
      result('r6', 'cal', 4000),
    ]);
    const effect = ratioEffect(ratios, { resamples: 500 });
    expect(effect).toMatchObject({ median: 1, results: 5, athletes: 2, excludesNoDifference: false });
    expect(effect!.low).toBeLessThanOrEqual(1);
    expect(effect!.high).toBeGreaterThanOrEqual(1);
  });

  it('is null when nobody has a baseline', () => {
    expect(ratioEffect(withinAthleteRatios([result('r1', 'cal', 4000)]))).toBeNull();
  });
});
