import { describe, expect, it } from '@jest/globals';

import { describeAuditChange } from './describe-audit.js';

const base = { status: 'FINISHED', finalStatus: 'FINISHED', dqReason: null, rawTimes: [4400], score: null, penaltyHundredths: 0, axeLabel: null, grind: null, bevelIncludedDeg: null, chiselWidthMm: null, blockCondition: null, place: 5, points: 3 };

describe('describeAuditChange', () => {
  it('names only what a correction changed, before → after', () => {
    const after = { ...base, rawTimes: [3900], place: 1, points: 7 };
    expect(describeAuditChange(JSON.stringify(base), JSON.stringify(after))).toBe('watches 44.00 → 39.00; place 5 → 1; points 3 → 7');
  });

  it('says what a first posting recorded', () => {
    const posted = { ...base, rawTimes: [4199, 4201], penaltyHundredths: 200, grind: 'CONVEX', bevelIncludedDeg: 32, blockCondition: 'SEASONED', place: 1, points: 6.5 };
    expect(describeAuditChange(null, JSON.stringify(posted))).toBe('Posted as finished: watches 41.99 / 42.01; penalty +2.00; grind Convex; bevel 32° included; block seasoned; place 1; points 6.5');
  });

  it('shows a disqualification with its reason, and unrecorded values as a dash', () => {
    const dq = { ...base, status: 'DISQUALIFIED', finalStatus: 'DISQUALIFIED', dqReason: 'foot outside the block', place: null, points: 0 };
    expect(describeAuditChange(JSON.stringify(base), JSON.stringify(dq))).toBe('status finished → disqualified; disqualified for — → foot outside the block; place 5 → —; points 3 → 0');
  });

  it('copes with a snapshot it cannot read', () => {
    expect(describeAuditChange(null, 'not json')).toBe('The change could not be read.');
    expect(describeAuditChange(JSON.stringify(base), JSON.stringify(base))).toBe('Saved again with no change.');
  });
});
