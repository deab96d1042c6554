import { ApiError } from '../api-error.js';
import { checkIndexUid } from '../engine.js';
import { listPage } from '../list-page.js';
import { accepted, ok, route, type Route } from '../route-table.js';

function primaryKeyOf(body: unknown): string | null {
  const value = (body as { primaryKey?: unknown } | undefined)?.primaryKey;
  if (value === undefined || value === null) return null;
  if (typeof value !== 'string') throw new ApiError('invalid_index_primary_key', '`primaryKey` is a string or null.');
  return value;
}

export const indexRoutes: Route[] = [
  route('GET', '/indexes', 'indexes.get', ({ engine, query }) => ok(listPage(engine.listIndexes(), query, 'invalid_index'))),
  route('POST', '/indexes', 'indexes.create', ({ engine, body }) => {
    const uid = (body as { uid?: unknown } | undefined)?.uid;
    if (uid === undefined) throw new ApiError('missing_index_uid', 'Creating an index needs a `uid`.');
    return accepted(engine.createIndex(checkIndexUid(uid), primaryKeyOf(body)));
  }),
  route('GET', '/indexes/:uid', 'indexes.get', ({ engine, params }) => ok(engine.index(params['uid'] as string).info())),
  route('PATCH', '/indexes/:uid', 'indexes.update', ({ engine, params, body }) =>
    accepted(engine.updateIndex(checkIndexUid(params['uid']), primaryKeyOf(body)))),
  route('DELETE', '/indexes/:uid', 'indexes.delete', ({ engine, params }) =>
    accepted(engine.deleteIndex(checkIndexUid(params['uid'])))),
  route('GET', '/indexes/:uid/stats', 'stats.get', ({ engine, params }) => {
    const index = engine.index(params['uid'] as string);
    const fieldDistribution: Record<string, number> = {};
    for (const doc of index.documents()) {
      for (const field of Object.keys(doc)) fieldDistribution[field] = (fieldDistribution[field] ?? 0) + 1;
    }
    return ok({ numberOfDocuments: index.size, isIndexing: false, fieldDistribution });
  }),
];
