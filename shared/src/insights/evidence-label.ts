/** How far a number on the Grain Map can be trusted. */
export type EvidenceLabel = 'strong' | 'suggestive' | 'not-enough-data';

/**
 * Thresholds behind every label, stated so a reader can check them.
 * - below minResults results or minAthletes athletes: `not-enough-data`, nothing is claimed;
 * - `strong`: at least strongMinResults results from strongMinAthletes athletes, a 95 %
 *   interval that excludes "no difference" and, for a comparison, an adjusted p below strongMaxP;
 * - otherwise `suggestive`: enough to look at, to be read as a lead rather than a finding.
 * A difference is called clear (worded as faster/slower) only when the interval excludes no
 * difference, or for a comparison when the adjusted p is below clearMaxP.
 */
export const EVIDENCE_THRESHOLDS = {
  minResults: 10,
  minAthletes: 3,
  strongMinResults: 30,
  strongMinAthletes: 6,
  strongMaxP: 0.01,
  clearMaxP: 0.05,
} as const;

export interface EvidenceFacts {
  results: number;
  athletes: number;
  /** Whether the data show a difference: interval excludes 1, or adjusted p < clearMaxP. */
  clearDifference: boolean;
  /** Adjusted p-value, for comparisons only. */
  p?: number;
}

export function evidenceLabel(facts: EvidenceFacts, thresholds = EVIDENCE_THRESHOLDS): EvidenceLabel {
  if (facts.results < thresholds.minResults || facts.athletes < thresholds.minAthletes) return 'not-enough-data';
  const bigEnough = facts.results >= thresholds.strongMinResults && facts.athletes >= thresholds.strongMinAthletes;
  const pStrong = facts.p === undefined || facts.p < thresholds.strongMaxP;
  return bigEnough && facts.clearDifference && pStrong ? 'strong' : 'suggestive';
}
