import { describe, expect, it } from '@jest/globals';

import { slugify } from './slugify.js';

describe('slugify', () => {
  it('joins words with hyphens and drops accents and punctuation', () => {
    expect(slugify('Épinette & Green Poplar: a first look!')).toBe('epinette-green-poplar-a-first-look');
  });

  it('falls back to a word when nothing is left', () => {
    expect(slugify('¿¡!?')).toBe('note');
  });

  it('stays within 80 characters without a trailing hyphen', () => {
    const slug = slugify(`${'a'.repeat(79)} b`);
    expect(slug.length).toBeLessThanOrEqual(80);
    expect(slug.endsWith('-')).toBe(false);
  });
});
