import { bootstrapMedianInterval, BOOTSTRAP_DEFAULTS, type BootstrapOptions } from '../stats/index.js';
import { summariseTrial, type TrialInput } from '../trials/index.js';
import type { EvidenceLabel } from './evidence-label.js';
import type { MedianWithInterval } from './insight-types.js';

/**
 * Trial evidence is a separate kind from race-time evidence: depth ratios against a club's
 * own reference axe, counted in trials rather than athletes.
 */
export const TRIAL_EVIDENCE_THRESHOLDS = { minTrials: 2, minAxeRows: 4, strongMinTrials: 5, strongMinAxeRows: 10 } as const;

export interface TrialEvidenceCell {
  source: 'trials';
  key: string;
  speciesId: string;
  condition: string;
  grind: string;
  /** Non-reference axes with a ratio; each is one axe on one block. */
  axeRows: number;
  trials: number;
  /** Depth per swing ÷ the block's reference axe: above 1 cuts deeper. */
  ratio: MedianWithInterval;
  label: EvidenceLabel;
}

/** Species × condition × grind cells of depth ratios to the reference axe, across trials. */
export function trialEvidence(trials: readonly TrialInput[], bootstrap: BootstrapOptions = {}): TrialEvidenceCell[] {
  const groups = new Map<string, { speciesId: string; condition: string; grind: string; ratios: number[]; trials: Set<number> }>();
  trials.forEach((trial, trialIndex) => {
    for (const row of summariseTrial(trial)) {
      if (row.isReference || row.ratioToReference === null || row.head === null) continue;
      const key = JSON.stringify([trial.speciesId, trial.condition, row.head.grind]);
      const group = groups.get(key) ?? { speciesId: trial.speciesId, condition: trial.condition, grind: row.head.grind, ratios: [], trials: new Set() };
      group.ratios.push(row.ratioToReference);
      group.trials.add(trialIndex);
      groups.set(key, group);
    }
  });
  return [...groups.entries()]
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([key, group]) => {
      const interval = bootstrapMedianInterval(group.ratios, { ...BOOTSTRAP_DEFAULTS, ...bootstrap });
      return {
        source: 'trials' as const,
        key,
        speciesId: group.speciesId,
        condition: group.condition,
        grind: group.grind,
        axeRows: group.ratios.length,
        trials: group.trials.size,
        ratio: { median: interval.estimate, low: interval.low, high: interval.high },
        label: trialLabel(group.ratios.length, group.trials.size, interval.low > 1 || interval.high < 1),
      };
    });
}

function trialLabel(axeRows: number, trials: number, excludesNoDifference: boolean): EvidenceLabel {
  const t = TRIAL_EVIDENCE_THRESHOLDS;
  if (axeRows < t.minAxeRows || trials < t.minTrials) return 'not-enough-data';
  return axeRows >= t.strongMinAxeRows && trials >= t.strongMinTrials && excludesNoDifference ? 'strong' : 'suggestive';
}
