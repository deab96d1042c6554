import { ApiError } from './api-error.js';
import { compileFilter } from './compile-filter.js';
import { pickAttributes, valuesAt, type Doc } from './document-path.js';
import { countFacets, resolveFacets, type FacetResults } from './facet-counts.js';
import { formatHit, wordMatcher } from './format-hit.js';
import { filterablePatterns } from './index-settings.js';
import type { SearchIndex } from './search-index.js';
import type { SearchRequest } from './search-params.js';
import { compileSort } from './sort-order.js';
import type { TextMatch } from './text-index.js';
import { queryTerms } from './tokenize.js';

interface Candidate {
  doc: Doc;
  match: TextMatch | null;
  /** Place in the index: the last tie-break. */
  order: number;
  rankingScore: number;
}

export type SearchResponse = Record<string, unknown> & Partial<FacetResults>;

function candidates(index: SearchIndex, request: SearchRequest): Candidate[] {
  const predicate = compileFilter(request.filter, filterablePatterns(index.settings));
  if (request.q.trim() === '') {
    const all: Candidate[] = [];
    let order = 0;
    for (const doc of index.documents()) {
      if (predicate === null || predicate(doc)) all.push({ doc, match: null, order, rankingScore: 1 });
      order += 1;
    }
    return all;
  }
  const searchable = index.searchableFields();
  const searchOn = request.attributesToSearchOn;
  if (searchOn !== null) {
    const unknown = searchOn.filter((name) => !searchable.includes(name) && !index.settings.searchableAttributes.includes('*'));
    if (unknown.length > 0) {
      throw new ApiError('invalid_search_attributes_to_search_on', `Attribute${unknown.length > 1 ? 's' : ''} ${unknown.map((name) => `\`${name}\``).join(', ')} not searchable.`);
    }
  }
  const matches = index.text.search({
    query: request.q,
    fields: searchOn ?? undefined,
    strategy: request.matchingStrategy,
    typo: index.settings.typoTolerance,
    accept: predicate === null ? undefined : (id) => {
      const doc = index.get(id);
      return doc !== undefined && predicate(doc);
    },
  });
  const words = Math.max(1, queryTerms(request.q).length);
  const best = matches.reduce((top, match) => Math.max(top, match.score), 0) || 1;
  const found: Candidate[] = [];
  for (const match of matches) {
    const doc = index.get(match.id);
    if (doc === undefined) continue;
    // A score from 0 to 1: the share of query words found, scaled by relevance against the best hit.
    const rankingScore = (match.wordsMatched / words) * (0.5 + (0.5 * match.score) / best);
    found.push({ doc, match, order: index.orderOf(match.id), rankingScore });
  }
  return found;
}

function rank(list: Candidate[], index: SearchIndex, request: SearchRequest): Candidate[] {
  const byRelevance = (a: Candidate, b: Candidate): number =>
    (b.match?.wordsMatched ?? 0) - (a.match?.wordsMatched ?? 0)
    || (b.match?.score ?? 0) - (a.match?.score ?? 0)
    || a.order - b.order;
  if (request.sort === null || request.sort.length === 0) return list.sort(byRelevance);
  const sortOrder = compileSort(request.sort, index.settings.sortableAttributes);
  const keyed = list.map((candidate) => ({ candidate, keys: sortOrder.keysOf(candidate.doc) }));
  keyed.sort((a, b) => sortOrder.compare(a.keys, b.keys) || byRelevance(a.candidate, b.candidate));
  return keyed.map((entry) => entry.candidate);
}

function distinctBy(list: Candidate[], attribute: string | null): Candidate[] {
  if (attribute === null) return list;
  const seen = new Set<string>();
  return list.filter((candidate) => {
    const values = valuesAt(candidate.doc, attribute);
    if (values.length === 0) return true;
    const key = JSON.stringify(values[0]);
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
}

/** One search over one index: match, filter, facet, rank, page and format. */
export function runSearch(index: SearchIndex, request: SearchRequest): SearchResponse {
  const started = performance.now();
  const facets = request.facets === null ? null : resolveFacets(request.facets, filterablePatterns(index.settings));
  let list = rank(candidates(index, request), index, request);
  list = distinctBy(list, request.distinct ?? index.settings.distinctAttribute);
  if (request.rankingScoreThreshold !== null) list = list.filter((c) => c.rankingScore >= (request.rankingScoreThreshold as number));
  const facetResults = facets === null ? null : countFacets(list.map((c) => c.doc), facets, index.settings);
  const reachable = Math.min(list.length, index.settings.pagination.maxTotalHits);
  const paging = request.pageMode;
  const offset = paging === null ? request.offset : (paging.page - 1) * paging.hitsPerPage;
  const limit = paging === null ? request.limit : paging.page === 0 ? 0 : paging.hitsPerPage;
  const page = list.slice(Math.min(offset, reachable), Math.min(offset + limit, reachable));
  const response: SearchResponse = {
    hits: page.map((candidate) => toHit(candidate, index, request)),
    query: request.q,
    processingTimeMs: 0,
  };
  if (paging === null) Object.assign(response, { limit: request.limit, offset: request.offset, estimatedTotalHits: list.length });
  else {
    const totalPages = paging.hitsPerPage === 0 ? 0 : Math.ceil(reachable / paging.hitsPerPage);
    Object.assign(response, { hitsPerPage: paging.hitsPerPage, page: paging.page, totalPages, totalHits: reachable });
  }
  if (facetResults !== null) Object.assign(response, facetResults);
  response.processingTimeMs = Math.round(performance.now() - started);
  return response;
}

function toHit(candidate: Candidate, index: SearchIndex, request: SearchRequest): Doc {
  const displayed = pickAttributes(candidate.doc, index.settings.displayedAttributes);
  const hit = pickAttributes(displayed, request.attributesToRetrieve);
  if (request.attributesToHighlight !== null || request.attributesToCrop !== null) {
    const words = queryTerms(request.q);
    const prefixWord = /\s$/u.test(request.q) ? null : (words[words.length - 1] ?? null);
    hit['_formatted'] = formatHit(hit, {
      highlight: request.attributesToHighlight,
      crop: request.attributesToCrop,
      cropLength: request.cropLength,
      cropMarker: request.cropMarker,
      preTag: request.highlightPreTag,
      postTag: request.highlightPostTag,
      matcher: wordMatcher(words, candidate.match?.terms ?? [], prefixWord),
    });
  }
  if (request.showRankingScore) hit['_rankingScore'] = Math.round(candidate.rankingScore * 10000) / 10000;
  return hit;
}
