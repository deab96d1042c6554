import { ApiError } from '../api-error.js';
import { listPage, listParam } from '../list-page.js';
import { ok, route, type Route, type RouteContext } from '../route-table.js';
import type { Task } from '../task-queue.js';

function keysOrRefuse({ masterKey, keys }: RouteContext) {
  if (masterKey === null) throw new ApiError('missing_master_key', 'The search service runs without a master key, so it has no API keys.');
  return keys;
}

function taskFilter(query: URLSearchParams): (task: Task) => boolean {
  const statuses = listParam(query, 'statuses');
  const types = listParam(query, 'types');
  const indexUids = listParam(query, 'indexUids');
  const uids = listParam(query, 'uids');
  return (task) =>
    (statuses === null || statuses.includes(task.status))
    && (types === null || types.includes(task.type))
    && (indexUids === null || (task.indexUid !== null && indexUids.includes(task.indexUid)))
    && (uids === null || uids.includes(String(task.uid)));
}

export const serviceRoutes: Route[] = [
  route('GET', '/health', null, () => ok({ status: 'available' })),
  route('GET', '/version', 'version', () => ok({ commitSha: 'search-fake', commitDate: '1970-01-01T00:00:00Z', pkgVersion: '0.1.0' })),
  route('GET', '/keys', 'keys.get', (context) => ok(listPage(keysOrRefuse(context), context.query, 'invalid_api_key'))),
  route('GET', '/keys/:key', 'keys.get', (context) => {
    const wanted = context.params['key'];
    const key = keysOrRefuse(context).find((candidate) => candidate.uid === wanted || candidate.key === wanted);
    if (key === undefined) throw new ApiError('api_key_not_found', `API key \`${wanted}\` not found.`);
    return ok(key);
  }),
  route('GET', '/tasks', 'tasks.get', ({ engine, query }) => {
    const limit = Number(query.get('limit') ?? 20);
    const from = query.get('from') === null ? null : Number(query.get('from'));
    if (!Number.isInteger(limit) || limit < 0) throw new ApiError('invalid_task_limit', '`limit` is a non-negative integer.');
    if (from !== null && !Number.isInteger(from)) throw new ApiError('invalid_task_from', '`from` is a task uid.');
    const matching = engine.tasks.all().filter(taskFilter(query));
    const fromHere = from === null ? matching : matching.filter((task) => task.uid <= from);
    const results = fromHere.slice(0, limit);
    const next = fromHere[limit]?.uid ?? null;
    return ok({ results, total: matching.length, limit, from: results[0]?.uid ?? null, next });
  }),
  route('GET', '/tasks/:uid', 'tasks.get', ({ engine, params }) => {
    const task = /^\d+$/.test(params['uid'] as string) ? engine.tasks.get(Number(params['uid'])) : undefined;
    if (task === undefined) throw new ApiError('task_not_found', `Task \`${params['uid']}\` not found.`);
    return ok(task);
  }),
  route('GET', '/stats', 'stats.get', ({ engine }) => {
    const indexes = Object.fromEntries(engine.listIndexes().map((info) => [
      info.uid, { numberOfDocuments: engine.index(info.uid).size, isIndexing: false },
    ]));
    const lastUpdate = engine.listIndexes().map((info) => info.updatedAt).sort().pop() ?? null;
    return ok({ databaseSize: 0, lastUpdate, indexes });
  }),
];
