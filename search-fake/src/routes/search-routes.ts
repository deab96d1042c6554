import { listParam } from '../list-page.js';
import { ok, route, type Route } from '../route-table.js';

const NUMBERS = ['limit', 'offset', 'page', 'hitsPerPage', 'cropLength', 'rankingScoreThreshold'];
const LISTS = ['facets', 'sort', 'attributesToRetrieve', 'attributesToHighlight', 'attributesToCrop', 'attributesToSearchOn'];
const FLAGS = ['showRankingScore', 'showMatchesPosition', 'showRankingScoreDetails'];

/** The GET form of search: query parameters as the POST body would carry them. */
function bodyFromQuery(query: URLSearchParams): Record<string, unknown> {
  const body: Record<string, unknown> = {};
  for (const [name, value] of query) {
    if (NUMBERS.includes(name)) body[name] = Number(value);
    else if (LISTS.includes(name)) body[name] = listParam(query, name) ?? ['*'];
    else if (FLAGS.includes(name)) body[name] = value === 'true';
    else body[name] = value;
  }
  return body;
}

export const searchRoutes: Route[] = [
  route('POST', '/indexes/:uid/search', 'search', ({ engine, params, body }) => ok(engine.search(params['uid'] as string, body ?? {}))),
  route('GET', '/indexes/:uid/search', 'search', ({ engine, params, query }) => ok(engine.search(params['uid'] as string, bodyFromQuery(query)))),
  route('POST', '/multi-search', 'search', ({ engine, body }) => ok(engine.multiSearch(body))),
];
