import { describe, expect, it } from '@jest/globals';

import type { Result } from '../api/types.js';
import { progression } from './progression.js';

const r = (over: Partial<Result>): Result => ({
  eventTypeId: 'uh', eventName: 'Underhand chop', resultKind: 'TIMED', diameterMm: 304.8, place: 1, totalHundredths: 4000, score: null,
  meetDate: '2026-10-17', meetName: 'Autumn', ...over,
}) as Result;

describe('progression', () => {
  it('draws one line per event and diameter, oldest first, in seconds', () => {
    // Hand-worked: 4137 hundredths = 41.37 s; the 254 mm block is its own line.
    const lines = progression([
      r({ meetDate: '2026-12-12', totalHundredths: 3990 }),
      r({ meetDate: '2026-10-17', totalHundredths: 4137 }),
      r({ diameterMm: 254, totalHundredths: 3000 }),
    ], (mm) => `${mm} mm`);
    expect(lines.map((l) => [l.label, l.points.map((p) => p.value)])).toEqual([
      ['Underhand chop, 304.8 mm', [41.37, 39.9]],
      ['Underhand chop, 254 mm', [30]],
    ]);
  });

  it('leaves out results without a place', () => {
    expect(progression([r({ place: null })], String)).toEqual([]);
  });
});
