import { ARTICLE_KINDS, type ArticleKind } from '@endgrain/shared';
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';

import type { FieldNotesFilter } from '../api/types.js';

export interface NoteUrlFilter {
  kind: ArticleKind | '';
  species: string;
  grind: string;
  event: string;
  condition: string;
}

const KEYS = ['kind', 'species', 'grind', 'event', 'condition'] as const;

/** The Field Notes list's filters live in the address, so a filtered list can be shared. */
export function useNoteFilter() {
  const [params, setParams] = useSearchParams();
  const filter = useMemo<NoteUrlFilter>(() => {
    const kind = params.get('kind') ?? '';
    return {
      kind: (ARTICLE_KINDS as readonly string[]).includes(kind) ? (kind as ArticleKind) : '',
      species: params.get('species') ?? '',
      grind: params.get('grind') ?? '',
      event: params.get('event') ?? '',
      condition: params.get('condition') ?? '',
    };
  }, [params]);

  const setFilter = useCallback(
    (change: Partial<NoteUrlFilter>) => {
      const next = { ...filter, ...change };
      const query = new URLSearchParams();
      for (const key of KEYS) if (next[key]) query.set(key, next[key]);
      setParams(query, { replace: true });
    },
    [filter, setParams],
  );

  const variables: FieldNotesFilter = { limit: 60, offset: 0 };
  for (const key of KEYS) if (filter[key]) Object.assign(variables, { [key]: filter[key] });
  const active = KEYS.some((key) => filter[key] !== '');
  return { filter, setFilter, variables, active };
}
