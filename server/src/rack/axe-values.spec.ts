import { describe, expect, it } from '@jest/globals';

import { setupChanges, setupValues, type AxeSetup } from './axe-values.js';

const setup: AxeSetup = {
  grind: 'CHISEL',
  bevelIncludedDeg: 15,
  chiselWidthMm: 19.05,
  headWeightG: 2495,
  bitWidthMm: 133.35,
  handleLengthMm: 762,
  handleWood: 'hickory',
  hangChecked: true,
  pinned: true,
  status: 'READY',
  allowedFor: 'ANYONE',
};

describe('setupValues', () => {
  it('refuses a chisel width on a flat or convex grind', () => {
    expect(() => setupValues({ ...setup, grind: 'FLAT' })).toThrow('no chisel');
    expect(() => setupValues({ ...setup, grind: 'CONVEX' })).toThrow('no chisel');
    expect(setupValues({ ...setup, grind: 'COMPOUND' }).chiselWidthMm).toBe(19.05);
  });

  it('names the included angle and the per-side relation when an angle is out of range', () => {
    expect(() => setupValues({ ...setup, bevelIncludedDeg: 75 })).toThrow('included angle, across both faces');
  });

  it('prints both unit systems in a length error', () => {
    // 150 mm ÷ 25.4 = 5.9055 in → "5.91 in" (2 decimals); 1500 mm ÷ 25.4 = 59.055 in → "59.06 in".
    expect(() => setupValues({ ...setup, handleLengthMm: 30 })).toThrow('between 150 mm (5.91 in) and 1500 mm (59.06 in)');
  });
});

describe('setupChanges', () => {
  it('lists just the fields that changed, before and after', () => {
    const after = { ...setup, bevelIncludedDeg: 16, status: 'NEEDS_EDGE' as const };
    expect(setupChanges(setup, after)).toEqual([
      { field: 'bevelIncludedDeg', before: 15, after: 16 },
      { field: 'status', before: 'READY', after: 'NEEDS_EDGE' },
    ]);
    expect(setupChanges(setup, { ...setup })).toEqual([]);
  });

  it('records a cleared chisel as a change to null', () => {
    expect(setupChanges(setup, { ...setup, grind: 'FLAT', chiselWidthMm: null })).toEqual([
      { field: 'grind', before: 'CHISEL', after: 'FLAT' },
      { field: 'chiselWidthMm', before: 19.05, after: null },
    ]);
  });
});
