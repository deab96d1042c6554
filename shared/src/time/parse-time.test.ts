import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import { formatTime } from './format-time.js';
import { parseTime } from './parse-time.js';

describe('parseTime', () => {
  it.each([
    // hand-worked: 1 min 5 s = 65 s = 6500 hundredths, + 20 → 6520
    ['1:05.20', 6520],
    ['1:05.2', 6520],
    ['1:05', 6500],
    // hand-worked: 45 s = 4500 hundredths, + 23 → 4523; ".5" is five tenths = 50 hundredths
    ['45.23', 4523],
    ['45.5', 4550],
    ['45', 4500],
    ['9.05', 905],
    // hand-worked: seconds alone may pass a minute: 75.20 s = 7520 hundredths = 1:15.20
    ['75.20', 7520],
    ['0:45.23', 4523],
    // hand-worked: 12 min 3.45 s = 723.45 s = 72345 hundredths
    ['12:03.45', 72345],
    ['  1:05.20 ', 6520],
  ])('reads %j as %d hundredths', (text, hundredths) => {
    expect(parseTime(text)).toEqual({ ok: true, hundredths });
  });

  it('refuses one-digit seconds after a colon', () => {
    expect(parseTime('1:5.3')).toEqual({ ok: false, message: '"1:5.3" is not m:ss.hh' });
  });

  it('refuses 60 or more seconds after the minutes', () => {
    expect(parseTime('1:60.00')).toEqual({
      ok: false,
      message: '"1:60.00": seconds must be under 60 after the minutes',
    });
  });

  it('refuses thousandths instead of rounding them', () => {
    expect(parseTime('45.234')).toEqual({ ok: false, message: '"45.234" is not a time (m:ss.hh or ss.hh)' });
    expect(parseTime('1:05.234')).toEqual({ ok: false, message: '"1:05.234" is not m:ss.hh' });
  });

  it.each(['', 'abc', '-45.23', '45.', '.5', '1:', ':05.20', '1:05:20'])('refuses %j', (text) => {
    expect(parseTime(text).ok).toBe(false);
  });

  it('reads back every formatted time', () => {
    // property: parseTime(formatTime(h)) = h for every whole hundredth up to ten hours
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 3_600_000 }), (hundredths) => {
        expect(parseTime(formatTime(hundredths))).toEqual({ ok: true, hundredths });
      }),
    );
  });
});
