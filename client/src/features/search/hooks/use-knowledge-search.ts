import { knowledgeSearchRequest, type FacetSelection } from '@endgrain/shared';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { SearchResponse } from 'meilisearch';
import { useMemo } from 'react';

import type { KnowledgeHit } from '../api/knowledge-hit.js';
import { fetchSearchConfig } from '../api/search-config.js';
import { searchClientFor } from '../lib/search-client.js';
import { useDebounced } from './use-debounced.js';

const TYPING_PAUSE_MS = 150;

/**
 * Searches the knowledge index from the browser with the SDK and the search-only key, through
 * TanStack Query: the config is fetched once, each search is cached by words and facets, and the
 * previous results stay on screen while the next ones arrive.
 */
export function useKnowledgeSearch(words: string, selection: FacetSelection, limit = 20) {
  const config = useQuery({ queryKey: ['search-config'], queryFn: fetchSearchConfig, staleTime: 5 * 60_000, retry: 1 });
  const settledWords = useDebounced(words, TYPING_PAUSE_MS);
  const request = useMemo(() => knowledgeSearchRequest(settledWords, selection, { limit }), [settledWords, selection, limit]);
  const search = useQuery({
    queryKey: ['knowledge-search', config.data?.indexUid, request.q, request.params.filter, limit],
    queryFn: async ({ signal }) => {
      const client = await searchClientFor(config.data!);
      return client.index(config.data!.indexUid).search<KnowledgeHit>(request.q, request.params, { signal }) as Promise<SearchResponse<KnowledgeHit>>;
    },
    enabled: config.data !== undefined,
    placeholderData: keepPreviousData,
    staleTime: 15_000,
  });
  return {
    response: search.data,
    isFetching: search.isFetching || (words !== settledWords && words.trim() !== ''),
    error: config.error ?? search.error,
    retry: () => void (config.error ? config.refetch() : search.refetch()),
    ready: config.data !== undefined,
  };
}
