import { describe, expect, it } from '@jest/globals';

import { checkArticleTags } from './article-tags.js';

describe('checkArticleTags', () => {
  it('accepts tags from the species table, grinds, event catalogue and conditions', () => {
    const { tags, problems } = checkArticleTags({ species: ['quaking-aspen'], grinds: ['CHISEL'], events: ['underhand-chop'], conditions: ['GREEN'], free: [' Wet  Wood '] });
    expect(problems).toEqual([]);
    expect(tags.free).toEqual(['wet wood']);
  });

  it('names the unknown tag and its field', () => {
    const { problems } = checkArticleTags({ species: ['ironwood-of-dreams'], conditions: ['SOGGY'] });
    expect(problems).toEqual([
      { field: 'tags.species', message: '"ironwood-of-dreams" is not a species Endgrain knows.' },
      { field: 'tags.conditions', message: '"SOGGY" is not a block condition Endgrain knows.' },
    ]);
  });

  it('drops repeated tags', () => {
    expect(checkArticleTags({ grinds: ['FLAT', 'FLAT'] }).tags.grinds).toEqual(['FLAT']);
  });

  it('refuses free tags with markup characters', () => {
    expect(checkArticleTags({ free: ['<b>'] }).problems).toHaveLength(1);
  });
});
