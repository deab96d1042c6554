import { describe, expect, it } from '@jest/globals';

import { formatDiameter } from './format-diameter.js';

describe('formatDiameter', () => {
  it('prints millimetres for metric readers and inches for imperial ones, unit always shown', () => {
    // exact: 1 in = 25.4 mm (NIST SP 811, App. B.8), so 355.6 mm = 14 in
    expect(formatDiameter(355.6, 'METRIC')).toBe('356 mm');
    expect(formatDiameter(355.6, 'IMPERIAL')).toBe('14 in');
  });

  it('rounds a metric-cut block to a tenth of an inch', () => {
    // hand-worked: 305 ÷ 25.4 = 12.0079 in → 12.0 → "12 in"; 325 ÷ 25.4 = 12.795 → "12.8 in"
    expect(formatDiameter(305, 'IMPERIAL')).toBe('12 in');
    expect(formatDiameter(325, 'IMPERIAL')).toBe('12.8 in');
  });
});
