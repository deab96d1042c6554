import { describe, expect, it } from '@jest/globals';

import { seededRandom } from '../stats/index.js';
import { fitDiameterExponent, type DiameterRow } from './fit-diameter-exponent.js';

const row = (athleteId: string, diameterMm: number, hundredths: number): DiameterRow => ({
  athleteId,
  eventType: 'underhand-chop',
  speciesId: 'eastern-white-pine',
  diameterMm,
  hundredths,
});

/** Invented league: athletes of different speeds, each on several diameters, time ∝ d^k × noise. */
function simulated(k: number, noise: number, athletes = 8): DiameterRow[] {
  const random = seededRandom(11);
  const rows: DiameterRow[] = [];
  for (let a = 0; a < athletes; a++) {
    const speed = 2000 + 400 * a;
    for (const d of [275, 300, 325, 350, 375]) {
      const jitter = Math.exp(noise * (random() - 0.5));
      rows.push(row(`athlete-${a}`, d, speed * (d / 300) ** k * jitter));
    }
  }
  return rows;
}

describe('fitDiameterExponent', () => {
  it('fits a hand-worked two-athlete case', () => {
    // Hand-worked: A 3000 → 4000 and B 2000 → 2800 going from 300 to 350 mm.
    // Per athlete slopes ln(4/3)/ln(7/6) = 1.866239 and ln(1.4)/ln(7/6) = 2.182749; equal x spread,
    // so the within-athlete slope is their mean 2.024494. Residual df = 4 − 2 − (2 − 1) = 1 and
    // SE = |1.866239 − 2.182749|/2 = 0.158255 (RSS = h²(sA − sB)², Sxx = 4h², h = ln(7/6)/2).
    const fit = fitDiameterExponent(
      [row('a', 300, 3000), row('a', 350, 4000), row('b', 300, 2000), row('b', 350, 2800)],
      { minResults: 4, minAthletes: 2 },
    );
    expect(fit.source).toBe('fitted');
    expect(fit.exponent).toBeCloseTo(2.024494, 6);
    expect(fit.standardError).toBeCloseTo(0.158255, 6);
  });

  it('recovers an exact exponent whatever each athlete’s speed', () => {
    // Construction: every time is speed × (d/300)^2.5 exactly → slope 2.5 with no residual.
    const fit = fitDiameterExponent(simulated(2.5, 0));
    expect(fit.exponent).toBeCloseTo(2.5, 10);
    expect(fit.standardError).toBeCloseTo(0, 10);
    expect(fit.results).toBe(40);
    expect(fit.athletes).toBe(8);
  });

  it('brackets the true exponent when times are noisy', () => {
    // Construction: k = 1.8 with ±5 % multiplicative noise; the 95 % interval should hold 1.8.
    const fit = fitDiameterExponent(simulated(1.8, 0.1));
    expect(fit.low!).toBeLessThan(1.8);
    expect(fit.high!).toBeGreaterThan(1.8);
    expect(fit.standardError!).toBeGreaterThan(0);
  });

  it('falls back to cross-section area with a note when data are thin', () => {
    // Threshold: 30 results from 5 athletes on two or more diameters; 4 athletes × 5 = 20 results is too few.
    const fit = fitDiameterExponent(simulated(2.5, 0, 4));
    expect(fit).toMatchObject({ source: 'default', exponent: 2, standardError: null, results: 20, athletes: 4 });
    expect(fit.note).toMatch(/using cross-section area/);
  });

  it('ignores athletes who only ever cut one diameter', () => {
    // Nine single-diameter athletes add no information about diameter: still counted as 0.
    const fit = fitDiameterExponent(Array.from({ length: 40 }, (_, i) => row(`solo-${i % 9}`, 300, 3000 + i)));
    expect(fit).toMatchObject({ source: 'default', results: 0, athletes: 0 });
  });
});
