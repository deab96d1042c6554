import { describe, expect, it } from '@jest/globals';

import { speciesWords, taggableSpecies } from './tag-vocabulary.js';

describe('tag vocabulary', () => {
  it('calls the aspens and cottonwoods poplar too', () => {
    // Populus: aspens, cottonwoods and balsam poplar are one genus (common practice in the trade).
    expect(speciesWords('quaking-aspen')).toEqual(['quaking', 'aspen', 'poplar', 'popple', 'populus']);
    expect(speciesWords('eastern-cottonwood')).toContain('poplar');
  });

  it('knows nothing about a species outside the table', () => {
    expect(speciesWords('unobtainium')).toEqual([]);
  });

  it('offers every species of the Wood Handbook table for tagging', () => {
    // Wood Handbook Table 5-3 rows transcribed in shared/src/species: 14 species.
    expect(taggableSpecies()).toHaveLength(14);
  });
});
