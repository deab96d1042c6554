import { describe, expect, it } from '@jest/globals';

import { evidenceLabel } from './evidence-label.js';

describe('evidenceLabel', () => {
  it('says not-enough-data below 10 results or 3 athletes, whatever the difference', () => {
    // Thresholds stated in EVIDENCE_THRESHOLDS: minResults 10, minAthletes 3.
    expect(evidenceLabel({ results: 9, athletes: 9, clearDifference: true, p: 1e-9 })).toBe('not-enough-data');
    expect(evidenceLabel({ results: 200, athletes: 2, clearDifference: true })).toBe('not-enough-data');
  });

  it('needs 30 results, 6 athletes, a clear difference and p below 0.01 for strong', () => {
    // Thresholds: strongMinResults 30, strongMinAthletes 6, strongMaxP 0.01.
    expect(evidenceLabel({ results: 30, athletes: 6, clearDifference: true, p: 0.009 })).toBe('strong');
    expect(evidenceLabel({ results: 30, athletes: 6, clearDifference: true, p: 0.02 })).toBe('suggestive');
    expect(evidenceLabel({ results: 29, athletes: 6, clearDifference: true })).toBe('suggestive');
    expect(evidenceLabel({ results: 30, athletes: 5, clearDifference: true })).toBe('suggestive');
    expect(evidenceLabel({ results: 300, athletes: 60, clearDifference: false })).toBe('suggestive');
  });
});
