import { describe, expect, it } from '@jest/globals';

import { depthPerSwing } from './depth-per-swing.js';

describe('depthPerSwing', () => {
  it('leaves opening strokes out of the mean and spread', () => {
    // Hand-worked: swings 20 (opening), 30, 28, 32 → counted 30, 28, 32; mean 90/3 = 30;
    // s = √((0 + 4 + 4)/2) = 2.
    const summary = depthPerSwing([{ depthMm: 20, opening: true }, { depthMm: 30 }, { depthMm: 28 }, { depthMm: 32 }]);
    expect(summary).toEqual({ counted: 3, openingExcluded: 1, meanMm: 30, sdMm: 2, minMm: 28, maxMm: 32 });
  });

  it('gives no spread for a single counted swing and nothing for none', () => {
    // Hand-worked: one swing has a mean but no sample standard deviation.
    expect(depthPerSwing([{ depthMm: 25 }])).toMatchObject({ counted: 1, meanMm: 25, sdMm: null });
    expect(depthPerSwing([{ depthMm: 12, opening: true }])).toMatchObject({ counted: 0, openingExcluded: 1, meanMm: null });
  });
});
