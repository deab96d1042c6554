import { MEET_STATUSES, type MeetStatus } from '@endgrain/shared';
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';

import type { MeetsFilter, MeetWhen } from '../api/types.js';

export interface MeetsUrlFilter {
  when: MeetWhen;
  seasonId: string;
  clubId: string;
  status: MeetStatus | '';
}

const isStatus = (value: string | null): value is MeetStatus => (MEET_STATUSES as readonly string[]).includes(value ?? '');

/**
 * The meets list's filters live in the address (?when=past&season=…&club=…&status=…), so a filtered
 * list can be bookmarked and shared, and the back button undoes a change.
 */
export function useMeetsFilter() {
  const [params, setParams] = useSearchParams();
  const filter = useMemo<MeetsUrlFilter>(() => {
    const status = params.get('status');
    return {
      when: params.get('when') === 'past' ? 'PAST' : 'UPCOMING',
      seasonId: params.get('season') ?? '',
      clubId: params.get('club') ?? '',
      status: isStatus(status) ? status : '',
    };
  }, [params]);

  const setFilter = useCallback(
    (change: Partial<MeetsUrlFilter>) => {
      const next = { ...filter, ...change };
      const query = new URLSearchParams();
      if (next.when === 'PAST') query.set('when', 'past');
      if (next.seasonId) query.set('season', next.seasonId);
      if (next.clubId) query.set('club', next.clubId);
      if (next.status) query.set('status', next.status);
      setParams(query);
    },
    [filter, setParams],
  );

  const variables: MeetsFilter = {
    when: filter.when,
    ...(filter.seasonId && { seasonId: filter.seasonId }),
    ...(filter.clubId && { clubId: filter.clubId }),
    ...(filter.status && { status: filter.status }),
  };
  const narrowed = Boolean(filter.seasonId || filter.clubId || filter.status);
  return { filter, setFilter, variables, narrowed };
}
