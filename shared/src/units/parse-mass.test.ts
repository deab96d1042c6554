import { describe, expect, it } from '@jest/globals';

import { parseMass } from './parse-mass.js';

describe('parseMass', () => {
  it.each([
    // 1959 international pound: 1 lb = 453.59237 g; hand-worked 3.5 lb = 1587.573295 g
    ['3.5 lb', 1587.573295],
    ['1 lbs', 453.59237],
    // hand-worked: 1.6 kg × 1000 = 1600 g
    ['1.6 kg', 1600],
    ['1590 g', 1590],
  ])('reads %j as %d g', (text, grams) => {
    expect(parseMass(text)).toEqual({ ok: true, grams });
  });

  it('refuses a bare number', () => {
    expect(parseMass('3.5')).toEqual({ ok: false, message: '"3.5" needs a unit (g, kg or lb)' });
  });
});
