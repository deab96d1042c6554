import { describe, expect, it } from '@jest/globals';

import { ordinal } from './ordinal.js';
import { sharedPlaces } from './shared-places.js';

describe('ordinal', () => {
  it('uses the English suffixes, with 11th–13th as the exception', () => {
    // English usage: 1st 2nd 3rd 4th, 11th 12th 13th, 21st 22nd 23rd, 101st, 111th.
    expect([1, 2, 3, 4, 11, 12, 13, 21, 22, 23, 101, 111].map(ordinal)).toEqual([
      '1st', '2nd', '3rd', '4th', '11th', '12th', '13th', '21st', '22nd', '23rd', '101st', '111th',
    ]);
  });
});

describe('sharedPlaces', () => {
  it('gives ties one place and skips the places they cover', () => {
    // Standard competition ranking: 40, 35, 35, 30 → 1, 2, 2, 4.
    expect(sharedPlaces([40, 35, 35, 30], (a, b) => a === b)).toEqual([1, 2, 2, 4]);
  });
});
