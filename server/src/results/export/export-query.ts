import { BLOCK_CONDITIONS, DIVISIONS, HEAD_GRINDS } from '@endgrain/shared';

import { DomainError } from '../../common/errors/domain-error.js';
import type { ExplorerFilter, ExplorerSort, ExplorerSortField } from '../results-explorer.repository.js';

const SORT_FIELDS: readonly ExplorerSortField[] = ['TIME', 'SCORE', 'PLACE', 'POINTS', 'DATE', 'DIAMETER', 'BEVEL'];
const IDS = ['seasonId', 'meetId', 'clubId', 'eventTypeId', 'speciesId'] as const;
const NUMBERS = ['diameterMinMm', 'diameterMaxMm', 'bevelMinDeg', 'bevelMaxDeg'] as const;

/** The explorer's filter and sort from a query string (the same names as the GraphQL input). */
export function exportQuery(query: Record<string, unknown>): { filter: ExplorerFilter; sort: ExplorerSort } {
  const text = (key: string): string | null => {
    const value = query[key];
    return typeof value === 'string' && value.trim() !== '' ? value.trim() : null;
  };
  const oneOf = <T extends string>(key: string, values: readonly T[]): T | null => {
    const value = text(key);
    if (value === null) return null;
    if (!values.includes(value as T)) throw DomainError.badInput(key, `${key} is one of ${values.join(', ')}.`);
    return value as T;
  };
  const filter: ExplorerFilter = {};
  for (const key of IDS) filter[key] = text(key);
  for (const key of NUMBERS) {
    const value = text(key);
    if (value !== null && !Number.isFinite(Number(value))) throw DomainError.badInput(key, `${key} is a number.`);
    filter[key] = value === null ? null : Number(value);
  }
  filter.division = oneOf('division', DIVISIONS);
  filter.grind = oneOf('grind', HEAD_GRINDS);
  filter.condition = oneOf('condition', BLOCK_CONDITIONS);
  filter.finishedOnly = text('finishedOnly') === 'true';
  return { filter, sort: { field: oneOf('sort', SORT_FIELDS) ?? 'TIME', direction: oneOf('direction', ['ASC', 'DESC'] as const) ?? 'ASC' } };
}
