import { describe, expect, it } from '@jest/globals';

import { DEMO_RACKS } from '../rack/seed-rack-data.js';
import { DEMO_TRIALS, seedSwings } from './seed-trials-data.js';
import { outOfUseReason } from './trial-axe-use.js';
import { DIAMETER_MM } from './trial-values.js';

describe('the demo trials', () => {
  it('number a dozen, across both demo racks and every block condition', () => {
    const all = Object.values(DEMO_TRIALS).flat();
    expect(all).toHaveLength(12);
    expect(new Set(all.map((t) => t.condition))).toEqual(new Set(['GREEN', 'SEASONED', 'DRY', 'PUNKY', 'FROZEN']));
  });

  it('use only axes of their own club, dated after each axe last changed setup', () => {
    for (const [club, trials] of Object.entries(DEMO_TRIALS)) {
      const rack = new Map(DEMO_RACKS[club]!.map((a) => [a.label, a]));
      for (const trial of trials) {
        for (const label of [trial.reference, ...trial.runs.map((r) => r.axe)]) {
          const axe = rack.get(label);
          expect(axe).toBeDefined();
          const setupDates = axe!.services.filter((s) => s.before && !('status' in s.before)).map((s) => s.doneOn);
          for (const day of setupDates) expect(trial.testedOn > day).toBe(true);
          // An axe taken out of use is not swung after the day it was tagged out.
          const taggedOut = axe!.services.find((s) => s.before && 'status' in s.before && outOfUseReason(axe!.status) !== null);
          if (taggedOut) expect(trial.testedOn < taggedOut.doneOn).toBe(true);
        }
        expect(trial.diameterMm).toBeGreaterThanOrEqual(DIAMETER_MM.min);
        expect(trial.runs.every((r) => r.tester < trial.testers.length)).toBe(true);
      }
    }
  });

  it('swing the reference axe in every trial', () => {
    for (const trial of Object.values(DEMO_TRIALS).flat()) expect(trial.runs.some((r) => r.axe === trial.reference)).toBe(true);
  });

  it('keep competition edges out of frozen wood', () => {
    // TRIAL_CAUTIONS: never test a competition edge in frozen wood; racing heads are the experienced-only ones.
    const racing = new Set(Object.values(DEMO_RACKS).flat().filter((a) => a.allowedFor === 'EXPERIENCED_ONLY').map((a) => a.label));
    for (const trial of Object.values(DEMO_TRIALS).flat().filter((t) => t.condition === 'FROZEN' || (t.airTempC ?? 1) <= 0)) {
      expect(trial.runs.filter((r) => racing.has(r.axe))).toEqual([]);
    }
  });

  it('spread counted swings around the stated mean after one opening stroke', () => {
    // Hand-worked for 40 mm, shift 0: 40 × (0.94, 1.03, 1.05, 0.98, 1) = 37.6, 41.2, 42, 39.2, 40 → to 0.5 mm:
    // 37.5, 41, 42, 39, 40; opening 40 × 0.55 = 22.
    expect(seedSwings(40, 0)).toEqual([
      { depthMm: 22, opening: true },
      { depthMm: 37.5, opening: false },
      { depthMm: 41, opening: false },
      { depthMm: 42, opening: false },
      { depthMm: 39, opening: false },
      { depthMm: 40, opening: false },
    ]);
  });
});
