import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';

import type { GrainMapFilter } from '../api/types.js';

export interface GrainUrlFilter {
  event: string;
  division: string;
  seasons: string[];
  clubs: string[];
  condition: string;
  dmin: string;
  dmax: string;
  angle: string;
  chisel: string;
  /** Only this wood's row is shown; the numbers stay those of the whole map, since an athlete's usual time spans every wood. */
  species: string;
  /** The open cell, "species~grind". */
  cell: string;
}

const LISTS = ['seasons', 'clubs'] as const;
const TEXTS = ['event', 'division', 'condition', 'dmin', 'dmax', 'angle', 'chisel', 'species', 'cell'] as const;

/** The Grain Map's filters and open cell live in the address, so a view can be shared and bookmarked. */
export function useGrainFilter(defaultEventId: string) {
  const [params, setParams] = useSearchParams();
  const filter = useMemo<GrainUrlFilter>(() => {
    const text = (key: string) => params.get(key) ?? '';
    const list = (key: string) => (params.get(key) ?? '').split(',').filter(Boolean);
    return {
      event: text('event') || defaultEventId,
      division: text('division'),
      seasons: list('seasons'),
      clubs: list('clubs'),
      condition: text('condition'),
      dmin: text('dmin'),
      dmax: text('dmax'),
      angle: text('angle'),
      chisel: text('chisel'),
      species: text('species'),
      cell: text('cell'),
    };
  }, [params, defaultEventId]);

  const setFilter = useCallback(
    (change: Partial<GrainUrlFilter>) => {
      const next = { ...filter, ...change };
      const query = new URLSearchParams();
      for (const key of TEXTS) if (next[key]) query.set(key, next[key]);
      for (const key of LISTS) if (next[key].length > 0) query.set(key, next[key].join(','));
      setParams(query);
    },
    [filter, setParams],
  );

  return { filter, setFilter, variables: toVariables(filter) };
}

export function toVariables(filter: GrainUrlFilter): GrainMapFilter {
  const number = (text: string) => (text.trim() === '' || !Number.isFinite(Number(text)) ? undefined : Number(text));
  const v: GrainMapFilter = { eventTypeId: filter.event };
  if (filter.division) v.division = filter.division;
  if (filter.seasons.length) v.seasonIds = filter.seasons;
  if (filter.clubs.length) v.clubIds = filter.clubs;
  if (filter.condition) v.condition = filter.condition;
  const dmin = number(filter.dmin);
  const dmax = number(filter.dmax);
  if (dmin !== undefined) v.diameterMinMm = dmin;
  if (dmax !== undefined) v.diameterMaxMm = dmax;
  if (filter.angle) v.bevelBand = filter.angle;
  if (filter.chisel) v.chiselBand = filter.chisel;
  return v;
}

/** The same filter as CSV query text for GET /api/grain-map.csv. */
export function csvQuery(v: GrainMapFilter): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(v)) {
    if (value === undefined) continue;
    query.set(key, Array.isArray(value) ? value.join(',') : String(value));
  }
  return query.toString();
}
