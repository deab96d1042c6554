import { SEARCH_FACETS, type FacetSelection, type SearchFacet } from '@endgrain/shared';
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';

/** The words and chosen facets live in the address (`?q=…&species=a,b`), so a search can be shared. */
export function useSearchFilter() {
  const [params, setParams] = useSearchParams();
  const words = params.get('q') ?? '';
  const selection = useMemo<FacetSelection>(() => {
    const chosen: FacetSelection = {};
    for (const facet of SEARCH_FACETS) {
      const values = (params.get(facet) ?? '').split(',').filter(Boolean);
      if (values.length) chosen[facet] = values;
    }
    return chosen;
  }, [params]);

  const write = useCallback(
    (nextWords: string, nextSelection: FacetSelection) => {
      const query = new URLSearchParams();
      if (nextWords) query.set('q', nextWords);
      for (const facet of SEARCH_FACETS) {
        const values = nextSelection[facet] ?? [];
        if (values.length) query.set(facet, values.join(','));
      }
      setParams(query, { replace: true });
    },
    [setParams],
  );

  const toggle = (facet: SearchFacet, value: string) => {
    const current = selection[facet] ?? [];
    write(words, { ...selection, [facet]: current.includes(value) ? current.filter((v) => v !== value) : [...current, value] });
  };

  return {
    words,
    selection,
    setWords: (next: string) => write(next, selection),
    toggle,
    clearFacets: () => write(words, {}),
  };
}
