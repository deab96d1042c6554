import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';

import type { AxeStatus, AxeUse, Grind, RackFilter } from '../api/types.js';
import { AXE_STATUSES, AXE_USES, GRINDS } from './rack-labels.js';

export interface RackUrlFilter {
  clubId: string;
  grind: Grind | '';
  status: AxeStatus | '';
  use: AxeUse | '';
}

const oneOf = <T extends string>(list: readonly T[], value: string | null): T | '' => (list.includes(value as T) ? (value as T) : '');

/**
 * The rack's filters live in the address (?club=…&grind=…&status=…&use=…), so a filtered rack can be
 * bookmarked and shared and the back button undoes a change.
 */
export function useRackFilter(defaultClubId: string) {
  const [params, setParams] = useSearchParams();
  const filter = useMemo<RackUrlFilter>(
    () => ({
      clubId: params.get('club') ?? defaultClubId,
      grind: oneOf(GRINDS, params.get('grind')),
      status: oneOf(AXE_STATUSES, params.get('status')),
      use: oneOf(AXE_USES, params.get('use')),
    }),
    [params, defaultClubId],
  );

  const setFilter = useCallback(
    (change: Partial<RackUrlFilter>) => {
      const next = { ...filter, ...change };
      const query = new URLSearchParams();
      if (next.clubId && next.clubId !== defaultClubId) query.set('club', next.clubId);
      if (next.grind) query.set('grind', next.grind);
      if (next.status) query.set('status', next.status);
      if (next.use) query.set('use', next.use);
      setParams(query);
    },
    [filter, setParams, defaultClubId],
  );

  const variables: RackFilter = {
    ...(filter.grind && { grinds: [filter.grind] }),
    ...(filter.status && { statuses: [filter.status] }),
    ...(filter.use && { allowedFor: [filter.use] }),
  };
  return { filter, setFilter, variables, narrowed: Boolean(filter.grind || filter.status || filter.use) };
}
