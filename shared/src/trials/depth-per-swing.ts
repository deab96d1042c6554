import { mean, sampleStdDev } from '../stats/index.js';
import type { TrialSwing } from './trial-types.js';

export interface DepthSummary {
  counted: number;
  openingExcluded: number;
  meanMm: number | null;
  /** Sample standard deviation; null below two counted swings. */
  sdMm: number | null;
  minMm: number | null;
  maxMm: number | null;
}

/** Mean penetration per counted swing and its spread; opening strokes are left out. */
export function depthPerSwing(swings: readonly TrialSwing[]): DepthSummary {
  const depths = swings.filter((swing) => swing.opening !== true).map((swing) => swing.depthMm);
  const openingExcluded = swings.length - depths.length;
  if (depths.length === 0) {
    return { counted: 0, openingExcluded, meanMm: null, sdMm: null, minMm: null, maxMm: null };
  }
  return {
    counted: depths.length,
    openingExcluded,
    meanMm: mean(depths),
    sdMm: depths.length >= 2 ? sampleStdDev(depths) : null,
    minMm: Math.min(...depths),
    maxMm: Math.max(...depths),
  };
}
