import { describe, expect, it } from '@jest/globals';

import { emptyTags } from './article-tags.js';
import { articleKeywords, questionWords } from './search-words.js';

describe('questionWords', () => {
  it('keeps the words that matter in a question', () => {
    expect(questionWords('Which grind for wet poplar?')).toBe('grind wet poplar');
  });

  it('keeps a trailing space, which marks the last word as finished', () => {
    expect(questionWords('grind for wet ')).toBe('grind wet ');
  });

  it('keeps a question made only of small words rather than sending nothing', () => {
    expect(questionWords('what is it')).toBe('what is it');
  });
});

describe('articleKeywords', () => {
  it('turns green quaking aspen with a chisel grind into the words people ask with', () => {
    const words = articleKeywords('FINDING', { ...emptyTags(), species: ['quaking-aspen'], conditions: ['GREEN'], grinds: ['CHISEL'] });
    // Populus covers the aspens: "poplar" is the trade's word for them (common practice).
    expect(words).toEqual(expect.arrayContaining(['quaking', 'aspen', 'poplar', 'green', 'wet', 'chisel', 'grind', 'finding']));
  });

  it('adds the event name words and free tags', () => {
    const words = articleKeywords('GUIDE', { ...emptyTags(), events: ['underhand-chop'], free: ['first meet'] });
    expect(words).toEqual(['guide', 'underhand', 'chop', 'first meet']);
  });
});
