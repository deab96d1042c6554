import { byDepthThenLabel, rankTrialAxes, type RankedTrialAxe } from './rank-trial-axes.js';
import { sameDepth, sharedPlaces } from './shared-places.js';
import type { TrialAxeRow } from './summarise-trial.js';
import { releaseStep } from './trial-types.js';

/** Fewer counted swings than this and the row is flagged as thin. */
export const TRIAL_MIN_COUNTED_SWINGS = 3;

export type VerdictFlag =
  | 'binds'
  | 'placed-after-releasing-axes'
  | 'release-not-recorded'
  | 'edge-dull'
  | 'few-swings'
  | 'no-counted-swings';

export type TrialVerdictRow = RankedTrialAxe & { verdictPlace: number | null; flags: VerdictFlag[] };

/**
 * The combined verdict. Stated rule: an axe whose bit binds (release steps 1–2) is placed
 * after every axe that does not bind, whatever its depth; within each group axes go by
 * depth, and equal depths share a place. A binding axe that cut deeper than one placed
 * above it carries `placed-after-releasing-axes`, so the move is never silent. An axe with
 * no release rating is not treated as binding but is flagged.
 */
export function trialVerdict(rows: readonly TrialAxeRow[]): TrialVerdictRow[] {
  const ranked = rankTrialAxes(rows);
  const measured = ranked.filter((row) => row.depth.meanMm !== null);
  const releasing = measured.filter((row) => !binds(row)).sort(byDepthThenLabel);
  const binding = measured.filter(binds).sort(byDepthThenLabel);
  const ordered = [...releasing, ...binding];
  const places = sharedPlaces(ordered, (a, b) => binds(a) === binds(b) && sameDepth(a.depth.meanMm, b.depth.meanMm));
  const shallowestReleasing = Math.min(...releasing.map((row) => row.depth.meanMm!));
  const verdict = ordered.map((row, i) => {
    const flags = flagsFor(row);
    if (binds(row) && releasing.length > 0 && row.depth.meanMm! > shallowestReleasing) {
      flags.unshift('placed-after-releasing-axes');
    }
    return { ...row, verdictPlace: places[i]!, flags };
  });
  const unmeasured = ranked
    .filter((row) => row.depth.meanMm === null)
    .map((row) => ({ ...row, verdictPlace: null, flags: [...flagsFor(row), 'no-counted-swings' as const] }));
  return [...verdict, ...unmeasured];
}

function binds(row: TrialAxeRow): boolean {
  return row.release !== null && releaseStep(row.release).binds;
}

function flagsFor(row: TrialAxeRow): VerdictFlag[] {
  const flags: VerdictFlag[] = [];
  if (binds(row)) flags.push('binds');
  if (row.release === null) flags.push('release-not-recorded');
  if (row.keenness === 'dull') flags.push('edge-dull');
  if (row.depth.counted > 0 && row.depth.counted < TRIAL_MIN_COUNTED_SWINGS) flags.push('few-swings');
  return flags;
}
