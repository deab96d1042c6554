import { describe, expect, it } from '@jest/globals';

import { describeChange } from './describe-change.js';

describe('describeChange', () => {
  it('gives both angles of a regrind and lengths in the reader\'s units', () => {
    // Per-side = included ÷ 2 (symmetric bevel): 16° → 8°, 15° → 7.5°.
    expect(describeChange({ field: 'bevelIncludedDeg', before: '16', after: '15' }, 'METRIC')).toBe('Bevel: 16° included (8° per side) → 15° included (7.5° per side)');
    // 19.05 mm ÷ 25.4 = 0.75 in; 25.4 mm = 1 in (exact, NIST SP 811).
    expect(describeChange({ field: 'chiselWidthMm', before: '19.05', after: '25.4' }, 'IMPERIAL')).toBe('Chisel width: 0.75 in → 1 in');
  });

  it('names statuses and cleared values in words', () => {
    expect(describeChange({ field: 'status', before: 'NEEDS_EDGE', after: 'READY' }, 'METRIC')).toBe('Status: Needs an edge → Ready');
    expect(describeChange({ field: 'chiselWidthMm', before: '12.7', after: null }, 'METRIC')).toBe('Chisel width: 12.7 mm → not recorded');
  });
});
