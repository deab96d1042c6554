import { describe, expect, it } from '@jest/globals';

import { formatLength } from './format-length.js';

describe('formatLength', () => {
  it('prints millimetres with the unit', () => {
    // NIST SP 811 App. B.8: 12 in = 304.8 mm
    expect(formatLength(304.8, 'metric')).toBe('304.8 mm');
  });

  it('prints inches without trailing zeros', () => {
    // NIST SP 811 App. B.8: 304.8 mm = 12 in exactly, so no "12.00 in"
    expect(formatLength(304.8, 'imperial')).toBe('12 in');
  });

  it('rounds inches to two decimals by default', () => {
    // hand-worked: 325 / 25.4 = 12.7952… → 12.8 (two decimals, trailing zero dropped)
    expect(formatLength(325, 'imperial')).toBe('12.8 in');
  });

  it('honours the digits option', () => {
    // hand-worked: 325 / 25.4 = 12.79527… → 12.795 at three decimals; 6.35 mm → 6 mm at none
    expect(formatLength(325, 'imperial', { digits: 3 })).toBe('12.795 in');
    expect(formatLength(6.35, 'metric', { digits: 0 })).toBe('6 mm');
  });
});
