import { BLOCK_CONDITIONS, DIVISIONS, HEAD_GRINDS } from '@endgrain/shared';

import type { BlockCondition, Division, HeadGrind, ResultSortField, ResultsFilter, ResultsSort } from '../api/types.js';

export interface ExplorerState {
  filter: ResultsFilter;
  sort: ResultsSort;
  page: number;
  pageSize: number;
}

const SORTS: readonly ResultSortField[] = ['TIME', 'SCORE', 'PLACE', 'POINTS', 'DATE', 'DIAMETER', 'BEVEL'];
const PAGE_SIZES = [25, 50, 100];
const TEXT = { season: 'seasonId', meet: 'meetId', club: 'clubId', event: 'eventTypeId', species: 'speciesId' } as const;
const NUMBERS = { dmin: 'diameterMinMm', dmax: 'diameterMaxMm', bmin: 'bevelMinDeg', bmax: 'bevelMaxDeg' } as const;

const oneOf = <T extends string>(values: readonly T[], value: string | null): T | undefined =>
  values.find((v) => v.toLowerCase() === value?.toLowerCase());

/**
 * The explorer's state from the address (short lower-case names, lengths in millimetres so a
 * shared link means the same in every reader's units), and back.
 */
export function readExplorerParams(params: URLSearchParams): ExplorerState {
  const filter: ResultsFilter = {};
  for (const [key, field] of Object.entries(TEXT)) {
    const value = params.get(key);
    if (value) filter[field] = value;
  }
  for (const [key, field] of Object.entries(NUMBERS)) {
    const value = Number(params.get(key) ?? '');
    if (params.get(key) && Number.isFinite(value)) filter[field] = value;
  }
  const division = oneOf<Division>(DIVISIONS, params.get('division'));
  if (division) filter.division = division;
  const grind = oneOf<HeadGrind>(HEAD_GRINDS, params.get('grind'));
  if (grind) filter.grind = grind;
  const condition = oneOf<BlockCondition>(BLOCK_CONDITIONS, params.get('condition'));
  if (condition) filter.condition = condition;
  if (params.get('finished') === '1') filter.finishedOnly = true;
  const field = oneOf(SORTS, params.get('sort')) ?? 'TIME';
  const size = Number(params.get('size'));
  return {
    filter,
    sort: { field, direction: params.get('dir') === 'desc' ? 'DESC' : 'ASC' },
    page: Math.max(0, Math.floor(Number(params.get('page')) || 0)),
    pageSize: PAGE_SIZES.includes(size) ? size : 25,
  };
}

export function writeExplorerParams(state: ExplorerState): URLSearchParams {
  const params = new URLSearchParams();
  for (const [key, field] of Object.entries(TEXT)) if (state.filter[field]) params.set(key, state.filter[field]);
  for (const [key, field] of Object.entries(NUMBERS)) if (typeof state.filter[field] === 'number') params.set(key, String(state.filter[field]));
  if (state.filter.division) params.set('division', state.filter.division.toLowerCase());
  if (state.filter.grind) params.set('grind', state.filter.grind.toLowerCase());
  if (state.filter.condition) params.set('condition', state.filter.condition.toLowerCase());
  if (state.filter.finishedOnly) params.set('finished', '1');
  if (state.sort.field !== 'TIME') params.set('sort', state.sort.field.toLowerCase());
  if (state.sort.direction === 'DESC') params.set('dir', 'desc');
  if (state.page > 0) params.set('page', String(state.page));
  if (state.pageSize !== 25) params.set('size', String(state.pageSize));
  return params;
}

/** The export route takes the GraphQL filter's own names. */
export function exportHref(state: Pick<ExplorerState, 'filter' | 'sort'>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(state.filter)) if (value !== undefined && value !== '') params.set(key, String(value));
  params.set('sort', state.sort.field);
  params.set('direction', state.sort.direction);
  return `/api/results.csv?${params.toString()}`;
}
