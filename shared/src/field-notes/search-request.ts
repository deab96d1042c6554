import { HIGHLIGHT_POST, HIGHLIGHT_PRE, SEARCH_FACETS, type SearchFacet } from './search-settings.js';
import { questionWords } from './search-words.js';

export type FacetSelection = Partial<Record<SearchFacet, readonly string[]>>;

export interface KnowledgeSearchRequest {
  q: string;
  params: {
    filter: string[][];
    facets: string[];
    attributesToRetrieve: string[];
    attributesToHighlight: string[];
    attributesToCrop: string[];
    cropLength: number;
    highlightPreTag: string;
    highlightPostTag: string;
    matchingStrategy: 'frequency';
    /** Newest first when there are no words to rank by. */
    sort?: string[];
    limit: number;
    offset: number;
  };
}

/** A filter value in double quotes; our ids never hold quotes, but escape them anyway. */
function quoted(value: string): string {
  return `"${value.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`;
}

/**
 * The search the client sends for a question and the chosen facets: stop words dropped,
 * facets OR-ed within and AND-ed across, highlights with our markers, a cropped text excerpt.
 * "frequency" drops the commonest words first when not every word matches, not the last ones.
 */
export function knowledgeSearchRequest(question: string, selection: FacetSelection = {}, page: { limit?: number; offset?: number } = {}): KnowledgeSearchRequest {
  const filter = SEARCH_FACETS.flatMap((facet) => {
    const values = selection[facet] ?? [];
    return values.length ? [values.map((v) => `${facet} = ${quoted(v)}`)] : [];
  });
  const q = questionWords(question);
  return {
    q,
    params: {
      ...(q.trim() === '' ? { sort: ['publishedAt:desc'] } : {}),
      filter,
      facets: [...SEARCH_FACETS],
      attributesToRetrieve: ['id', 'kind', 'slug', 'title', 'summary', 'url', 'species', 'grind', 'event', 'condition', 'evidence', 'authorName', 'publishedAt'],
      attributesToHighlight: ['title', 'summary'],
      attributesToCrop: ['text'],
      cropLength: 24,
      highlightPreTag: HIGHLIGHT_PRE,
      highlightPostTag: HIGHLIGHT_POST,
      matchingStrategy: 'frequency',
      limit: page.limit ?? 20,
      offset: page.offset ?? 0,
    },
  };
}
