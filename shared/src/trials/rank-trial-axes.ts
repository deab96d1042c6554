import { sameDepth, sharedPlaces } from './shared-places.js';
import type { TrialAxeRow } from './summarise-trial.js';

export type RankedTrialAxe = TrialAxeRow & { depthPlace: number | null };

/**
 * Rank by mean depth per counted swing, deepest first; equal depths (at 0.1 mm) share a
 * place; an axe with no counted swing gets no place and goes last.
 */
export function rankTrialAxes(rows: readonly TrialAxeRow[]): RankedTrialAxe[] {
  const measured = rows.filter((row) => row.depth.meanMm !== null).sort(byDepthThenLabel);
  const places = sharedPlaces(measured, (a, b) => sameDepth(a.depth.meanMm, b.depth.meanMm));
  const unmeasured = rows.filter((row) => row.depth.meanMm === null).sort(byLabel);
  return [
    ...measured.map((row, i) => ({ ...row, depthPlace: places[i]! })),
    ...unmeasured.map((row) => ({ ...row, depthPlace: null })),
  ];
}

export function byDepthThenLabel(a: TrialAxeRow, b: TrialAxeRow): number {
  if (!sameDepth(a.depth.meanMm, b.depth.meanMm)) return (b.depth.meanMm ?? -1) - (a.depth.meanMm ?? -1);
  return byLabel(a, b);
}

function byLabel(a: TrialAxeRow, b: TrialAxeRow): number {
  return a.axeLabel.localeCompare(b.axeLabel, 'en') || a.axeId.localeCompare(b.axeId, 'en');
}
