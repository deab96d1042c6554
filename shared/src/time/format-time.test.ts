import { describe, expect, it } from '@jest/globals';

import { formatTime } from './format-time.js';

describe('formatTime', () => {
  it.each([
    // hand-worked: 4523 hundredths = 45 s + 23 hundredths, under a minute → no minutes
    [4523, '45.23'],
    [905, '9.05'],
    [0, '0.00'],
    // hand-worked: 5999 = 59 s + 99 hundredths, the last time without minutes
    [5999, '59.99'],
    // hand-worked: 6000 = 60 s = 1 min 0 s
    [6000, '1:00.00'],
    // hand-worked: 6520 = 65 s + 20 hundredths = 1 min 5 s → seconds padded to two digits
    [6520, '1:05.20'],
    // hand-worked: 72345 = 723 s + 45 hundredths = 12 min 3 s
    [72345, '12:03.45'],
  ])('prints %d hundredths as %j', (hundredths, text) => {
    expect(formatTime(hundredths)).toBe(text);
  });

  it.each([-1, 12.5, Number.NaN])('refuses %d', (hundredths) => {
    expect(() => formatTime(hundredths)).toThrow(RangeError);
  });
});
