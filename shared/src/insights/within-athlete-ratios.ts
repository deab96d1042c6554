import { median } from '../stats/index.js';
import type { RaceResult } from './insight-types.js';
import { normaliseTime, type NormaliseOptions } from './normalise-time.js';

export interface AthleteRatio {
  resultId: string;
  athleteId: string;
  normalisedHundredths: number;
  /** The athlete's median normalised time in this event type and species. */
  baselineHundredths: number;
  /** Results behind the baseline, this one included. */
  baselineCount: number;
  /**
   * Normalised time ÷ baseline: 0.96 is 4 % faster than the athlete's usual. Null when the
   * athlete has a single result there, since a result compared with itself says nothing.
   */
  ratio: number | null;
}

/**
 * Each result against the same athlete's usual time on that event and species, so fast
 * and slow athletes can be pooled: what a grind does shows up as a ratio, not as who used it.
 */
export function withinAthleteRatios(results: readonly RaceResult[], options: NormaliseOptions = {}): AthleteRatio[] {
  const normalised = results.map((r) => ({ r, t: normaliseTime(r.hundredths, r.diameterMm, options) }));
  const strata = new Map<string, number[]>();
  for (const { r, t } of normalised) {
    const key = stratumKey(r);
    strata.set(key, [...(strata.get(key) ?? []), t]);
  }
  return normalised.map(({ r, t }) => {
    const times = strata.get(stratumKey(r))!;
    const baseline = median(times);
    return {
      resultId: r.resultId,
      athleteId: r.athleteId,
      normalisedHundredths: t,
      baselineHundredths: baseline,
      baselineCount: times.length,
      ratio: times.length >= 2 && baseline > 0 ? t / baseline : null,
    };
  });
}

function stratumKey(r: RaceResult): string {
  return JSON.stringify([r.athleteId, r.eventType, r.speciesId]);
}
