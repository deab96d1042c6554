import { ApiError } from './api-error.js';

export interface TypoToleranceSettings {
  enabled: boolean;
  minWordSizeForTypos: { oneTypo: number; twoTypos: number };
  disableOnWords: string[];
  disableOnAttributes: string[];
  disableOnNumbers: boolean;
}

export interface IndexSettings {
  displayedAttributes: string[];
  searchableAttributes: string[];
  filterableAttributes: unknown[];
  sortableAttributes: string[];
  rankingRules: string[];
  stopWords: string[];
  nonSeparatorTokens: string[];
  separatorTokens: string[];
  dictionary: string[];
  synonyms: Record<string, string[]>;
  distinctAttribute: string | null;
  proximityPrecision: string;
  typoTolerance: TypoToleranceSettings;
  faceting: { maxValuesPerFacet: number; sortFacetValuesBy: Record<string, string> };
  pagination: { maxTotalHits: number };
  searchCutoffMs: number | null;
  localizedAttributes: unknown[] | null;
  facetSearch: boolean;
  prefixSearch: string;
}

export type SettingName = keyof IndexSettings;

/** The values a fresh index starts with, as the hosted service reports them. */
export function defaultSettings(): IndexSettings {
  return {
    displayedAttributes: ['*'],
    searchableAttributes: ['*'],
    filterableAttributes: [],
    sortableAttributes: [],
    rankingRules: ['words', 'typo', 'proximity', 'attribute', 'sort', 'exactness'],
    stopWords: [],
    nonSeparatorTokens: [],
    separatorTokens: [],
    dictionary: [],
    synonyms: {},
    distinctAttribute: null,
    proximityPrecision: 'byWord',
    typoTolerance: {
      enabled: true,
      minWordSizeForTypos: { oneTypo: 5, twoTypos: 9 },
      disableOnWords: [],
      disableOnAttributes: [],
      disableOnNumbers: false,
    },
    faceting: { maxValuesPerFacet: 100, sortFacetValuesBy: { '*': 'alpha' } },
    pagination: { maxTotalHits: 1000 },
    searchCutoffMs: null,
    localizedAttributes: null,
    facetSearch: true,
    prefixSearch: 'indexingTime',
  };
}

const STRING_LISTS = new Set<string>([
  'displayedAttributes', 'searchableAttributes', 'sortableAttributes', 'rankingRules',
  'stopWords', 'nonSeparatorTokens', 'separatorTokens', 'dictionary',
]);
const OBJECTS = new Set<string>(['typoTolerance', 'faceting', 'pagination', 'synonyms']);

export function isSettingName(name: string): name is SettingName {
  return name in defaultSettings();
}

/** `filterable-attributes` → `filterableAttributes`, for the per-setting routes. */
export function settingFromRoute(segment: string): SettingName | null {
  const name = segment.replace(/-([a-z])/g, (_, letter: string) => letter.toUpperCase());
  return isSettingName(name) ? name : null;
}

function invalid(name: string, expected: string): ApiError {
  const code = `invalid_settings_${name.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`)}`;
  return new ApiError(code, `Setting \`${name}\` expects ${expected}.`);
}

function isStringArray(value: unknown): value is string[] {
  return Array.isArray(value) && value.every((item) => typeof item === 'string');
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** Checks one setting's new value before a task is enqueued, as the service does. */
export function validateSetting(name: string, value: unknown): void {
  if (!isSettingName(name)) throw new ApiError('bad_request', `Unknown setting \`${name}\`.`);
  if (value === null) return;
  if (STRING_LISTS.has(name) && !isStringArray(value)) throw invalid(name, 'an array of strings or null');
  if (OBJECTS.has(name) && !isObject(value)) throw invalid(name, 'an object or null');
  if (name === 'filterableAttributes') {
    const ok = Array.isArray(value) && value.every((item) =>
      typeof item === 'string' || (isObject(item) && isStringArray(item['attributePatterns'])));
    if (!ok) throw invalid(name, 'an array of attribute names or `{attributePatterns}` objects, or null');
  }
  if (name === 'distinctAttribute' && typeof value !== 'string') throw invalid(name, 'a string or null');
  if (name === 'searchCutoffMs' && typeof value !== 'number') throw invalid(name, 'a number or null');
  if (name === 'facetSearch' && typeof value !== 'boolean') throw invalid(name, 'a boolean or null');
}

/** Checks a whole settings body (PATCH `/settings`). */
export function validateSettingsPatch(body: unknown): Record<string, unknown> {
  if (!isObject(body)) throw new ApiError('bad_request', 'Settings are sent as a JSON object.');
  for (const [name, value] of Object.entries(body)) validateSetting(name, value);
  return body;
}

function mergeObject(current: unknown, patch: Record<string, unknown>, defaults: unknown): unknown {
  const out: Record<string, unknown> = { ...(current as Record<string, unknown>) };
  for (const [key, value] of Object.entries(patch)) {
    const fallback = (defaults as Record<string, unknown>)[key];
    out[key] = value === null ? fallback : isObject(value) && isObject(fallback) ? { ...fallback, ...value } : value;
  }
  return out;
}

/** Applies a partial settings body: `null` resets a key; nested objects merge, except synonyms, which replace. */
export function applySettingsPatch(current: IndexSettings, patch: Record<string, unknown>): IndexSettings {
  const defaults = defaultSettings();
  const next: Record<string, unknown> = { ...current };
  for (const [name, value] of Object.entries(patch)) {
    if (!isSettingName(name)) continue;
    if (value === null) next[name] = defaults[name];
    else if (OBJECTS.has(name) && name !== 'synonyms') next[name] = mergeObject(current[name], value as Record<string, unknown>, defaults[name]);
    else next[name] = value;
  }
  return next as unknown as IndexSettings;
}

/** Attribute names and patterns that may be filtered or faceted on. */
export function filterablePatterns(settings: IndexSettings): string[] {
  return settings.filterableAttributes.flatMap((item) =>
    typeof item === 'string' ? [item] : ((item as { attributePatterns: string[] }).attributePatterns));
}
