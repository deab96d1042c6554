import { describe, expect, it } from '@jest/globals';

import { parseLength } from './parse-length.js';

describe('parseLength', () => {
  it.each([
    // NIST SP 811 App. B.8: 12 in = 304.8 mm, whatever the spelling of the unit
    ['12 in', 304.8],
    ['12in', 304.8],
    ['12"', 304.8],
    ['12 inches', 304.8],
    ['  12 IN ', 304.8],
    // hand-worked: 12.5 × 25.4 = 317.5; 0.25 × 25.4 = 6.35
    ['12 1/2 in', 317.5],
    ['1/4"', 6.35],
    ['.25 in', 6.35],
    // millimetres pass through; hand-worked: 30.5 cm × 10 = 305 mm
    ['305 mm', 305],
    ['30.5 cm', 305],
  ])('reads %j as %d mm', (text, mm) => {
    expect(parseLength(text)).toEqual({ ok: true, mm });
  });

  it('refuses a bare number instead of guessing the unit', () => {
    expect(parseLength('12')).toEqual({ ok: false, message: '"12" needs a unit (mm, cm, in or ")' });
  });

  it('names an unknown unit', () => {
    expect(parseLength('1 ft')).toEqual({
      ok: false,
      message: '"1 ft" has an unknown unit "ft" (use mm, cm, in or ")',
    });
  });

  it('refuses text that is not a number', () => {
    expect(parseLength('twelve in')).toEqual({
      ok: false,
      message: '"twelve in" is not a length like "12 in" or "305 mm"',
    });
    expect(parseLength('-12 in').ok).toBe(false);
  });

  it('refuses a zero denominator', () => {
    expect(parseLength('1/0 in')).toEqual({ ok: false, message: '"1/0 in" has a fraction with a zero denominator' });
  });
});
