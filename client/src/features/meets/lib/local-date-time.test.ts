import { describe, expect, it } from '@jest/globals';

import { fromLocalInput, toLocalInput } from './local-date-time.js';

describe('local date-time input text', () => {
  it('reads the input back to the same instant it was made from', () => {
    // round trip in whatever zone the test machine has: local text → instant → local text
    const iso = fromLocalInput('2026-10-14T20:00');
    expect(iso).not.toBeNull();
    expect(toLocalInput(iso!)).toBe('2026-10-14T20:00');
  });

  it('refuses text that is not a date and a time', () => {
    expect(fromLocalInput('')).toBeNull();
    expect(fromLocalInput('2026-10-14')).toBeNull();
    expect(fromLocalInput('2026-13-40T99:00')).toBeNull();
    expect(toLocalInput('soon')).toBe('');
  });
});
