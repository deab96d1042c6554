import { describe, expect, it } from '@jest/globals';

import { knowledgeSearchRequest } from './search-request.js';

describe('knowledgeSearchRequest', () => {
  it('ORs values within a facet and ANDs the facets', () => {
    const { q, params } = knowledgeSearchRequest('Which grind for wet poplar?', { species: ['quaking-aspen', 'bigtooth-aspen'], kind: ['FINDING'] });
    expect(q).toBe('grind wet poplar');
    // Array form of the filter (SEARCH-CONTRACT.md): outer elements AND, inner arrays OR.
    expect(params.filter).toEqual([['kind = "FINDING"'], ['species = "quaking-aspen"', 'species = "bigtooth-aspen"']]);
  });

  it('asks for every facet and our highlight markers', () => {
    const { params } = knowledgeSearchRequest('aspen');
    expect(params.facets).toEqual(['kind', 'species', 'grind', 'event', 'condition']);
    expect(params.highlightPreTag).toBe('\uE000');
  });

  it('sorts newest first only when there are no words to rank by', () => {
    expect(knowledgeSearchRequest('').params.sort).toEqual(['publishedAt:desc']);
    expect(knowledgeSearchRequest('aspen').params.sort).toBeUndefined();
  });

  it('escapes quotes in a filter value', () => {
    expect(knowledgeSearchRequest('x', { event: ['a"b'] }).params.filter).toEqual([['event = "a\\"b"']]);
  });
});
