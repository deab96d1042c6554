import { beforeAll, describe, expect, it } from '@jest/globals';
import { MeilisearchApiError, type Index } from 'meilisearch';

import { rejection, useTestFake } from './testing/start-test-fake.js';

// Invented field notes; numbers are made up for the checks below.
const ARTICLES = [
  { id: 'a1', title: 'Chisel grind on wet poplar', species: 'poplar', condition: 'wet', diameter: 300, tags: ['grind', 'underhand'], body: 'A thin chisel opens the cut early.' },
  { id: 'a2', title: 'Convex edge in dry aspen', species: 'aspen', condition: 'dry', diameter: 280, tags: ['edge'], body: 'Aspen rewards a keen convex edge.' },
  { id: 'a3', title: 'Frozen blocks and edge care', species: 'poplar', condition: 'frozen', diameter: 350, tags: ['safety'], body: 'Never test a competition edge in frozen wood.' },
  { id: 'a4', title: 'Basswood for first cuts', species: 'basswood', condition: 'dry', diameter: 250, tags: ['newcomers'], body: 'Soft and even, basswood forgives a poor swing.' },
  { id: 'a5', title: 'Standing block heights', species: 'white pine', condition: 'green', diameter: 320, tags: ['standing block'], body: 'Set the block at knee height; poplar works as well.' },
  { id: 'a6', title: 'Bevel angle notes', species: 'aspen', condition: 'wet', diameter: 300, tags: ['bevel', 'grind'], body: 'Per-side bevel of twelve degrees held up.' },
];

const t = useTestFake();
let index: Index;

beforeAll(async () => {
  index = t().client.index('articles');
  await index.addDocuments(ARTICLES, { primaryKey: 'id' }).waitTask();
  await index.updateSettings({
    searchableAttributes: ['title', 'tags', 'body'],
    filterableAttributes: ['species', 'condition', 'diameter', 'tags'],
    sortableAttributes: ['diameter', 'title'],
  }).waitTask();
});

const ids = (hits: Record<string, unknown>[]): unknown[] => hits.map((hit) => hit['id']);

describe('matching words', () => {
  it('finds poplar when the user types "poplr"', async () => {
    const { hits } = await index.search('poplr');
    // hand-worked: "poplar" is one insertion away from "poplr" (5 letters → one typo allowed);
    // it is in a1's title and a5's body (species is not searchable here).
    expect(ids(hits)).toEqual(['a1', 'a5']);
  });

  it('matches the last word as a prefix while typing', async () => {
    expect(ids((await index.search('basswo')).hits)).toEqual(['a4']);
  });

  it('allows no typo in a word under five letters', async () => {
    // "edeg" is a transposition of "edge" but has only four letters.
    expect((await index.search('edeg ')).hits).toHaveLength(0);
  });

  it('ranks a title match above the same word in the body', async () => {
    // "poplar" is in a1's title and in a5's body; title comes first in searchableAttributes.
    expect(ids((await index.search('poplar')).hits)).toEqual(['a1', 'a5']);
    await index.updateSearchableAttributes(['body', 'tags', 'title']).waitTask();
    expect(ids((await index.search('poplar')).hits)).toEqual(['a5', 'a1']);
    await index.updateSearchableAttributes(['title', 'tags', 'body']).waitTask();
  });

  it('returns every document in insertion order for an empty query', async () => {
    expect(ids((await index.search(null)).hits)).toEqual(['a1', 'a2', 'a3', 'a4', 'a5', 'a6']);
    expect((await index.search('')).query).toBe('');
  });

  it('shows the new text after a document is replaced', async () => {
    await index.addDocuments([{ ...ARTICLES[3], title: 'Cottonwood for first cuts', species: 'cottonwood' }]).waitTask();
    expect((await index.search('basswood for')).hits.map((hit) => hit['title'])).not.toContain('Basswood for first cuts');
    expect(ids((await index.search('cottonwood')).hits)).toEqual(['a4']);
    await index.addDocuments([ARTICLES[3] as Record<string, unknown>]).waitTask();
  });
});

describe('filters', () => {
  it('returns only the filtered species', async () => {
    const { hits } = await index.search('edge', { filter: 'species = poplar' });
    expect(ids(hits)).toEqual(['a3']);
  });

  it('combines the array form: outer AND, inner OR', async () => {
    const { hits } = await index.search(null, { filter: [['species = aspen', 'species = basswood'], 'condition = dry'] });
    // hand-worked: aspen or basswood → a2, a4, a6; dry → a2, a4.
    expect(ids(hits)).toEqual(['a2', 'a4']);
  });

  it('handles ranges, IN, NOT and EXISTS', async () => {
    expect(ids((await index.search(null, { filter: 'diameter 280 TO 300' })).hits)).toEqual(['a1', 'a2', 'a6']);
    expect(ids((await index.search(null, { filter: 'condition IN [wet, frozen] AND NOT species = aspen' })).hits)).toEqual(['a1', 'a3']);
    expect(ids((await index.search(null, { filter: 'tags = GRIND' })).hits)).toEqual(['a1', 'a6']);
    expect((await index.search(null, { filter: 'species EXISTS' })).hits).toHaveLength(6);
  });

  it('refuses bad filter syntax with 400 invalid_search_filter', async () => {
    const error = await rejection(index.search('poplar', { filter: 'species = poplar AND' }));
    expect(error).toBeInstanceOf(MeilisearchApiError);
    expect(error.response?.status).toBe(400);
    expect(error.cause?.code).toBe('invalid_search_filter');
    expect(error.cause?.message).toContain('character 21');
  });

  it('refuses a filter on an attribute that is not filterable', async () => {
    const error = await rejection(index.search(null, { filter: 'title = x' }));
    expect(error.cause?.code).toBe('invalid_search_filter');
    expect(error.cause?.message).toContain('`title`');
  });
});

describe('facets and sorting', () => {
  it('counts facet values and numeric min and max', async () => {
    const result = await index.search(null, { facets: ['species', 'diameter'], limit: 0 });
    // hand-worked from ARTICLES: aspen a2, a6; basswood a4; poplar a1, a3; white pine a5.
    expect(result.facetDistribution?.['species']).toEqual({ aspen: 2, basswood: 1, poplar: 2, 'white pine': 1 });
    expect(result.facetStats?.['diameter']).toEqual({ min: 250, max: 350 });
    expect(result.facetStats?.['species']).toBeUndefined();
    expect(result.hits).toHaveLength(0);
    expect(result.estimatedTotalHits).toBe(6);
  });

  it('refuses a facet that is not filterable', async () => {
    const error = await rejection(index.search(null, { facets: ['body'] }));
    expect(error.cause?.code).toBe('invalid_search_facets');
  });

  it('sorts by a sortable attribute, ties by insertion order', async () => {
    const { hits } = await index.search(null, { sort: ['diameter:desc'] });
    // hand-worked: 350 a3, 320 a5, 300 a1 then a6 (a1 first inserted), 280 a2, 250 a4.
    expect(ids(hits)).toEqual(['a3', 'a5', 'a1', 'a6', 'a2', 'a4']);
  });

  it('refuses sorting on an attribute that is not sortable', async () => {
    const error = await rejection(index.search(null, { sort: ['species:asc'] }));
    expect(error.cause?.code).toBe('invalid_search_sort');
    expect(error.response?.status).toBe(400);
  });
});

describe('pages and formatting', () => {
  it('pages by limit and offset', async () => {
    const result = await index.search(null, { limit: 2, offset: 2 });
    expect(ids(result.hits)).toEqual(['a3', 'a4']);
    expect(result).toMatchObject({ limit: 2, offset: 2, estimatedTotalHits: 6 });
  });

  it('pages by page and hitsPerPage', async () => {
    const result = await index.search(null, { page: 2, hitsPerPage: 4 });
    expect(ids(result.hits)).toEqual(['a5', 'a6']);
    // hand-worked: 6 hits at 4 a page → 2 pages.
    expect(result).toMatchObject({ page: 2, hitsPerPage: 4, totalHits: 6, totalPages: 2 });
    expect(result).not.toHaveProperty('estimatedTotalHits');
  });

  it('wraps matches in custom tags and turns numbers into strings', async () => {
    const { hits } = await index.search('chisel', {
      attributesToHighlight: ['title', 'body'], highlightPreTag: '[[', highlightPostTag: ']]', filter: 'species = poplar',
    });
    const formatted = hits[0]?._formatted as Record<string, unknown>;
    expect(formatted['title']).toBe('[[Chisel]] grind on wet poplar');
    expect(formatted['body']).toBe('A thin [[chisel]] opens the cut early.');
    expect(formatted['diameter']).toBe('300');
  });

  it('highlights only the typed part of a prefix match', async () => {
    const { hits } = await index.search('bassw', { attributesToHighlight: ['title'] });
    expect((hits[0]?._formatted as Record<string, unknown>)['title']).toBe('<em>Bassw</em>ood for first cuts');
  });

  it('crops long text around the match', async () => {
    const { hits } = await index.search('frozen', { attributesToCrop: ['body'], cropLength: 3, filter: 'species = poplar' });
    // hand-worked: words of a3's body; "frozen" is the 7th of 8, so a window of 3 ends at the last word.
    expect((hits[0]?._formatted as Record<string, unknown>)['body']).toBe('…in frozen wood.');
  });

  it('retrieves only the asked attributes and shows a ranking score', async () => {
    const { hits } = await index.search('aspen', { attributesToRetrieve: ['id', 'species'], showRankingScore: true });
    expect(hits[0]).toEqual({ id: expect.any(String), species: 'aspen', _rankingScore: expect.any(Number) });
    for (const hit of hits) {
      expect(hit._rankingScore).toBeGreaterThan(0);
      expect(hit._rankingScore).toBeLessThanOrEqual(1);
    }
  });
});

describe('multi-search', () => {
  it('answers each query with its index uid', async () => {
    const { results } = await t().client.multiSearch({
      queries: [
        { indexUid: 'articles', q: 'aspen', limit: 1 },
        { indexUid: 'articles', q: null, filter: 'condition = frozen' },
      ],
    });
    expect(results.map((result) => result.indexUid)).toEqual(['articles', 'articles']);
    expect(results[0]?.hits).toHaveLength(1);
    expect(ids(results[1]?.hits ?? [])).toEqual(['a3']);
  });

  it('answers 404 index_not_found for a search on a missing index', async () => {
    const error = await rejection(t().client.index('nowhere').search('x'));
    expect(error.response?.status).toBe(404);
    expect(error.cause?.code).toBe('index_not_found');
  });
});
