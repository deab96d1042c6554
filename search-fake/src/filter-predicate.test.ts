import { describe, expect, it } from '@jest/globals';

import { parseFilter } from './filter-parser.js';
import { filterAttributes, filterPredicate } from './filter-predicate.js';

const DOCS = [
  { id: 1, species: 'Poplar', diameter: 300, tags: ['wet', 'grind'], maker: { town: 'Alderford' } },
  { id: 2, species: 'aspen', diameter: 280, tags: ['dry'] },
  { id: 3, diameter: 350, grind: null },
  { id: 4, species: 'Épinette', diameter: '300' },
];

function matching(expression: string): number[] {
  const predicate = filterPredicate(parseFilter(expression));
  return DOCS.filter((doc) => predicate(doc)).map((doc) => doc.id);
}

// Expected ids are hand-worked from DOCS above and the semantics in the search contract.
describe('filterPredicate', () => {
  it('compares strings ignoring case and accents', () => {
    expect(matching('species = poplar')).toEqual([1]);
    expect(matching('species = epinette')).toEqual([4]);
  });

  it('matches any element of an array field', () => {
    expect(matching('tags = grind')).toEqual([1]);
  });

  it('includes documents without the field for != and NOT', () => {
    expect(matching('species != poplar')).toEqual([2, 3, 4]);
    expect(matching('NOT species IN [poplar, aspen]')).toEqual([3, 4]);
  });

  it('compares numbers as numbers, and a numeric string only for equality', () => {
    expect(matching('diameter > 290')).toEqual([1, 3]);
    expect(matching('diameter = 300')).toEqual([1, 4]);
  });

  it('includes both ends of a range', () => {
    expect(matching('diameter 280 TO 300')).toEqual([1, 2]);
  });

  it('reads nested attributes by dotted path', () => {
    expect(matching('maker.town = alderford')).toEqual([1]);
  });

  it('counts a null value as existing', () => {
    expect(matching('grind EXISTS')).toEqual([3]);
    expect(matching('species NOT EXISTS')).toEqual([3]);
  });

  it('lists the attributes a filter reads', () => {
    expect([...filterAttributes(parseFilter('(a = 1 OR b = 2) AND NOT c EXISTS'))].sort()).toEqual(['a', 'b', 'c']);
  });
});
