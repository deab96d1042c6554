import { ApiError } from './api-error.js';
import { attributeAllowed, listForMessage } from './attribute-patterns.js';
import { valuesAt, type Doc } from './document-path.js';
import type { IndexSettings } from './index-settings.js';

export interface FacetResults {
  facetDistribution: Record<string, Record<string, number>>;
  facetStats: Record<string, { min: number; max: number }>;
}

/** The facets asked for, checked against the filterable attributes; `*` means all of them. */
export function resolveFacets(facets: readonly string[], filterable: readonly string[]): string[] {
  if (facets.includes('*')) return filterable.filter((name) => !name.includes('*'));
  for (const facet of facets) {
    if (!attributeAllowed(facet, filterable)) {
      throw new ApiError('invalid_search_facets', `Attribute \`${facet}\` cannot be a facet: it is not filterable. Filterable attributes: ${listForMessage(filterable)}.`);
    }
  }
  return [...facets];
}

function facetKey(value: unknown): string | null {
  if (typeof value === 'string') return value.trim() === '' ? null : value;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return null;
}

/** Counts each value of each facet over every matching document, and numeric min and max. */
export function countFacets(docs: readonly Doc[], facets: readonly string[], settings: IndexSettings): FacetResults {
  const facetDistribution: FacetResults['facetDistribution'] = {};
  const facetStats: FacetResults['facetStats'] = {};
  const { maxValuesPerFacet, sortFacetValuesBy } = settings.faceting;
  for (const facet of facets) {
    // Values that differ only in case count together, under the spelling seen first.
    const counts = new Map<string, { label: string; count: number }>();
    let min = Infinity;
    let max = -Infinity;
    for (const doc of docs) {
      const seen = new Set<string>();
      for (const value of valuesAt(doc, facet)) {
        if (typeof value === 'number') {
          min = Math.min(min, value);
          max = Math.max(max, value);
        }
        const label = facetKey(value);
        if (label === null) continue;
        const key = label.toLowerCase();
        if (seen.has(key)) continue;
        seen.add(key);
        const entry = counts.get(key);
        if (entry === undefined) counts.set(key, { label, count: 1 });
        else entry.count += 1;
      }
    }
    const byCount = (sortFacetValuesBy[facet] ?? sortFacetValuesBy['*']) === 'count';
    const entries = [...counts.values()].sort((a, b) =>
      byCount && a.count !== b.count ? b.count - a.count : a.label < b.label ? -1 : a.label > b.label ? 1 : 0);
    facetDistribution[facet] = Object.fromEntries(entries.slice(0, maxValuesPerFacet).map((entry) => [entry.label, entry.count]));
    if (min <= max) facetStats[facet] = { min, max };
  }
  return { facetDistribution, facetStats };
}
