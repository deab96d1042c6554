import { describe, expect, it } from '@jest/globals';

import { formatDay } from './format-day.js';
import { blockLabel, headLabel, markLabel, placeLabel, pointsLabel } from './format-result.js';

describe('result labels', () => {
  it('marks a shared place and names unplaced results by status', () => {
    expect(placeLabel({ place: 1, tied: true, status: 'FINISHED' })).toBe('1=');
    expect(placeLabel({ place: 3, tied: false, status: 'FINISHED' })).toBe('3');
    expect(placeLabel({ place: null, tied: false, status: 'DISQUALIFIED' })).toBe('DQ');
  });

  it('prints a timed mark as m:ss.hh and a hit count with its tie-breaking time', () => {
    // Hand-worked: 6523 hundredths = 1:05.23; 4137 = 41.37.
    expect(markLabel({ resultKind: 'TIMED', totalHundredths: 6523, score: null })).toBe('1:05.23');
    expect(markLabel({ resultKind: 'FEWEST_HITS', totalHundredths: 4137, score: 4 })).toBe('4 hits (41.37)');
    expect(markLabel({ resultKind: 'SCORED', totalHundredths: null, score: 17 })).toBe('17');
  });

  it('prints split points to the hundredth without a trailing zero', () => {
    // Hand-worked: (7 + 6) / 2 = 6.5.
    expect(pointsLabel(6.5)).toBe('6.5');
    expect(pointsLabel(4.33)).toBe('4.33');
    expect(pointsLabel(7)).toBe('7');
  });

  it('prints the head and block in the reader’s units', () => {
    // 6.35 mm = 0.25 in exactly (NIST SP 811: 25.4 mm per inch); 304.8 mm = 12 in.
    const head = { axeLabel: 'Race 3', grind: 'CONVEX' as const, bevelIncludedDeg: 32, chiselWidthMm: 6.35 };
    expect(headLabel(head, 'IMPERIAL')).toBe('“Race 3” · Convex · 32° included · chisel 0.25 in');
    expect(headLabel(head, 'METRIC')).toBe('“Race 3” · Convex · 32° included · chisel 6.4 mm');
    expect(blockLabel({ speciesName: 'Eastern white pine', diameterMm: 304.8, condition: 'GREEN' }, 'IMPERIAL')).toBe('Eastern white pine, 12 in, green / wet');
  });
});

describe('formatDay', () => {
  it('reads an ISO date as a calendar date', () => {
    // Hand-worked: 2026-10-17 is 17 October 2026 in any time zone.
    expect(formatDay('2026-10-17')).toBe('17 Oct 2026');
  });
});
