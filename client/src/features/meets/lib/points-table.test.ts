import { describe, expect, it } from '@jest/globals';

import { parsePointsTable, presetOf } from './points-table.js';

describe('parsePointsTable', () => {
  it('reads commas, dashes or spaces between places', () => {
    // hand-worked: the same five places written three ways
    expect(parsePointsTable('10, 8, 6, 4, 2')).toEqual({ ok: true, points: [10, 8, 6, 4, 2] });
    expect(parsePointsTable('10-8-6-4-2')).toEqual({ ok: true, points: [10, 8, 6, 4, 2] });
    expect(parsePointsTable(' 10 8 6 4 2 ')).toEqual({ ok: true, points: [10, 8, 6, 4, 2] });
    expect(parsePointsTable('10 - 8 - 6 - 4 - 2')).toEqual({ ok: true, points: [10, 8, 6, 4, 2] });
  });

  it('accepts half points and equal neighbours', () => {
    expect(parsePointsTable('9.5, 9.5, 7')).toEqual({ ok: true, points: [9.5, 9.5, 7] });
  });

  it('refuses a place that earns more than the place above it, naming both places', () => {
    // same wording as the server's check (server/src/meets/meet.validation.ts)
    expect(parsePointsTable('7, 6, 8')).toEqual({ ok: false, message: 'Place 3 cannot earn more points than place 2.' });
  });

  it('refuses negative points instead of reading the minus as a separator', () => {
    expect(parsePointsTable('7, -1')).toEqual({ ok: false, message: 'Points must be zero or more.' });
    expect(parsePointsTable('-2 -1')).toEqual({ ok: false, message: 'Points must be zero or more.' });
  });

  it('refuses words and an empty list', () => {
    expect(parsePointsTable('7, six')).toEqual({ ok: false, message: 'Place 2: "six" is not a number of points (zero or more).' });
    expect(parsePointsTable('  ').ok).toBe(false);
  });
});

describe('presetOf', () => {
  it('recognises the two common fixed tables and nothing else', () => {
    // tables from the trade: 7-6-5-4-3-2-1 and 5-4-3-2-1-0 (both in use at collegiate meets)
    expect(presetOf([7, 6, 5, 4, 3, 2, 1])).toBe('7-6-5-4-3-2-1');
    expect(presetOf([5, 4, 3, 2, 1, 0])).toBe('5-4-3-2-1-0');
    expect(presetOf([5, 4, 3, 2, 1])).toBeUndefined();
    expect(presetOf(null)).toBeUndefined();
  });
});
