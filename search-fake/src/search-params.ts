import { ApiError } from './api-error.js';
import type { MatchingStrategy } from './text-index.js';

export interface SearchRequest {
  q: string;
  filter: unknown;
  facets: string[] | null;
  sort: string[] | null;
  limit: number;
  offset: number;
  /** Set when `page` or `hitsPerPage` was sent: the response then counts pages. */
  pageMode: { page: number; hitsPerPage: number } | null;
  attributesToRetrieve: string[] | null;
  attributesToHighlight: string[] | null;
  highlightPreTag: string;
  highlightPostTag: string;
  attributesToCrop: string[] | null;
  cropLength: number;
  cropMarker: string;
  showRankingScore: boolean;
  rankingScoreThreshold: number | null;
  matchingStrategy: MatchingStrategy;
  attributesToSearchOn: string[] | null;
  distinct: string | null;
}

// Accepted so callers of the real service do not break here, but they change nothing.
const IGNORED = new Set([
  'showMatchesPosition', 'showRankingScoreDetails', 'showPerformanceDetails', 'retrieveVectors',
  'locales', 'vector', 'hybrid', 'media', 'personalize', 'federationOptions', 'indexUid',
]);
const KNOWN = new Set([
  'q', 'filter', 'facets', 'sort', 'limit', 'offset', 'page', 'hitsPerPage', 'attributesToRetrieve',
  'attributesToHighlight', 'highlightPreTag', 'highlightPostTag', 'attributesToCrop', 'cropLength',
  'cropMarker', 'showRankingScore', 'rankingScoreThreshold', 'matchingStrategy', 'attributesToSearchOn', 'distinct',
]);
const STRATEGIES = new Set(['last', 'all', 'frequency']);

function codeFor(name: string): string {
  return `invalid_search_${name.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`)}`;
}

class ParamReader {
  constructor(private readonly body: Record<string, unknown>) {}

  private raw(name: string): unknown {
    const value = this.body[name];
    return value === null ? undefined : value;
  }

  count(name: string, fallback: number): number {
    const value = this.raw(name);
    if (value === undefined) return fallback;
    if (typeof value !== 'number' || !Number.isInteger(value) || value < 0) {
      throw new ApiError(codeFor(name), `\`${name}\` is a non-negative integer, not ${JSON.stringify(value)}.`);
    }
    return value;
  }

  text(name: string, fallback: string): string {
    const value = this.raw(name);
    if (value === undefined) return fallback;
    if (typeof value !== 'string') throw new ApiError(codeFor(name), `\`${name}\` is a string, not ${JSON.stringify(value)}.`);
    return value;
  }

  names(name: string): string[] | null {
    const value = this.raw(name);
    if (value === undefined) return null;
    if (!Array.isArray(value) || !value.every((item) => typeof item === 'string')) {
      throw new ApiError(codeFor(name), `\`${name}\` is an array of strings, not ${JSON.stringify(value)}.`);
    }
    return value;
  }

  flag(name: string): boolean {
    const value = this.raw(name);
    if (value === undefined) return false;
    if (typeof value !== 'boolean') throw new ApiError(codeFor(name), `\`${name}\` is true or false, not ${JSON.stringify(value)}.`);
    return value;
  }
}

/** Reads and checks a search body; a bad parameter answers 400 with its own `invalid_search_*` code. */
export function parseSearchParams(body: unknown): SearchRequest {
  if (typeof body !== 'object' || body === null || Array.isArray(body)) {
    throw new ApiError('bad_request', 'A search body is a JSON object.');
  }
  const record = body as Record<string, unknown>;
  const unknown = Object.keys(record).filter((name) => !KNOWN.has(name) && !IGNORED.has(name));
  if (unknown.length > 0) {
    throw new ApiError('bad_request', `Unknown search parameter${unknown.length > 1 ? 's' : ''}: ${unknown.map((name) => `\`${name}\``).join(', ')}.`);
  }
  const read = new ParamReader(record);
  const strategy = read.text('matchingStrategy', 'last');
  if (!STRATEGIES.has(strategy)) {
    throw new ApiError('invalid_search_matching_strategy', `\`matchingStrategy\` is one of \`last\`, \`all\`, \`frequency\`, not \`${strategy}\`.`);
  }
  const threshold = record['rankingScoreThreshold'];
  if (threshold != null && (typeof threshold !== 'number' || threshold < 0 || threshold > 1)) {
    throw new ApiError('invalid_search_ranking_score_threshold', '`rankingScoreThreshold` is a number from 0 to 1.');
  }
  const pageMode = record['page'] != null || record['hitsPerPage'] != null;
  return {
    q: read.text('q', ''),
    filter: record['filter'] ?? null,
    facets: read.names('facets'),
    sort: read.names('sort'),
    limit: read.count('limit', 20),
    offset: read.count('offset', 0),
    pageMode: pageMode ? { page: read.count('page', 1), hitsPerPage: read.count('hitsPerPage', 20) } : null,
    attributesToRetrieve: read.names('attributesToRetrieve'),
    attributesToHighlight: read.names('attributesToHighlight'),
    highlightPreTag: read.text('highlightPreTag', '<em>'),
    highlightPostTag: read.text('highlightPostTag', '</em>'),
    attributesToCrop: read.names('attributesToCrop'),
    cropLength: read.count('cropLength', 10),
    cropMarker: read.text('cropMarker', '…'),
    showRankingScore: read.flag('showRankingScore'),
    rankingScoreThreshold: typeof threshold === 'number' ? threshold : null,
    matchingStrategy: strategy as MatchingStrategy,
    attributesToSearchOn: read.names('attributesToSearchOn'),
    distinct: record['distinct'] == null ? null : read.text('distinct', ''),
  };
}
