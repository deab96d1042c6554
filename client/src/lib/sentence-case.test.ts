import { describe, expect, it } from '@jest/globals';

import { sentenceCase } from './sentence-case.js';

describe('sentenceCase', () => {
  it('capitalises the first letter only', () => {
    expect(sentenceCase('quaking aspen')).toBe('Quaking aspen');
    expect(sentenceCase('yellow-poplar')).toBe('Yellow-poplar');
    expect(sentenceCase('')).toBe('');
  });
});
