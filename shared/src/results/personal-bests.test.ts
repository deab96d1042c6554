import { describe, expect, it } from '@jest/globals';

import { personalBests, type BestCandidate } from './personal-bests.js';

const r = (id: string, over: Partial<BestCandidate>): BestCandidate => ({
  id, eventTypeId: 'uh', kind: 'TIMED', diameterMm: 305, place: 1, totalHundredths: 4000, score: null, meetDate: '2026-10-01', ...over,
});

describe('personalBests', () => {
  it('keeps the lowest timed total per event and diameter', () => {
    // Hand-worked: on 305 mm, 38.50 beats 40.00 and 41.00; 254 mm is its own best.
    const bests = personalBests([
      r('a', { totalHundredths: 4000 }), r('b', { totalHundredths: 3850 }), r('c', { totalHundredths: 4100 }), r('d', { diameterMm: 254, totalHundredths: 3000 }),
    ]);
    expect(bests.map((b) => b.id)).toEqual(['b', 'd']);
  });

  it('ignores results without a place (scratch, did not finish, disqualified)', () => {
    expect(personalBests([r('a', { place: null, totalHundredths: 1000 }), r('b', { totalHundredths: 5000 })]).map((b) => b.id)).toEqual(['b']);
  });

  it('takes the highest score in scored events and the fewest hits in fewest-hits events, time breaking ties', () => {
    // DESIGN.md: scored — higher wins; fewest hits — fewer wins, time breaks ties.
    const scored = personalBests([
      r('s1', { eventTypeId: 'throw', kind: 'SCORED', score: 15, diameterMm: null }),
      r('s2', { eventTypeId: 'throw', kind: 'SCORED', score: 18, diameterMm: null }),
      r('h1', { eventTypeId: 'hits', kind: 'FEWEST_HITS', score: 4, totalHundredths: 1500 }),
      r('h2', { eventTypeId: 'hits', kind: 'FEWEST_HITS', score: 4, totalHundredths: 1400 }),
      r('h3', { eventTypeId: 'hits', kind: 'FEWEST_HITS', score: 5, totalHundredths: 900 }),
    ]);
    expect(scored.map((b) => b.id)).toEqual(['s2', 'h2']);
  });

  it('lets the earlier result keep a best it shares', () => {
    // Hand-worked: equal totals, the October result came first.
    const bests = personalBests([r('late', { meetDate: '2026-11-01' }), r('early', { meetDate: '2026-10-01' })]);
    expect(bests.map((b) => b.id)).toEqual(['early']);
  });
});
