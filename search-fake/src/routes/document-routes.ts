import { ApiError } from '../api-error.js';
import { compileFilter } from '../compile-filter.js';
import { pickAttributes, type Doc } from '../document-path.js';
import { filterablePatterns } from '../index-settings.js';
import { listPage, listParam } from '../list-page.js';
import { accepted, ok, route, type Route, type RouteContext } from '../route-table.js';
import type { SearchIndex } from '../search-index.js';

const isObject = (value: unknown): boolean => typeof value === 'object' && value !== null && !Array.isArray(value);

function documentsOf(body: unknown): unknown[] {
  if (Array.isArray(body) && body.every(isObject)) return body;
  if (isObject(body)) return [body];
  throw new ApiError('malformed_payload', 'Documents are sent as a JSON array of objects.');
}

function shown(index: SearchIndex, doc: Doc, fields: string[] | null): Doc {
  return pickAttributes(pickAttributes(doc, index.settings.displayedAttributes), fields);
}

function browse(index: SearchIndex, query: URLSearchParams, fields: string[] | null, filter: unknown) {
  const where = compileFilter(filter, filterablePatterns(index.settings), 'invalid_document_filter');
  const docs = [...index.documents()].filter((doc) => where === null || where(doc));
  const page = listPage(docs, query, 'invalid_document');
  return { ...page, results: page.results.map((doc) => shown(index, doc, fields)) };
}

function write(merge: boolean) {
  return ({ engine, params, query, body }: RouteContext) => {
    const primaryKey = query.get('primaryKey') ?? undefined;
    return accepted(engine.addDocuments(params['uid'] as string, documentsOf(body), { primaryKey, merge }));
  };
}

export const documentRoutes: Route[] = [
  route('GET', '/indexes/:uid/documents', 'documents.get', ({ engine, params, query }) =>
    ok(browse(engine.index(params['uid'] as string), query, listParam(query, 'fields'), query.get('filter')))),
  route('POST', '/indexes/:uid/documents/fetch', 'documents.get', ({ engine, params, body }) => {
    const options = (body ?? {}) as { offset?: number; limit?: number; fields?: string[]; filter?: unknown };
    const query = new URLSearchParams();
    if (options.offset !== undefined) query.set('offset', String(options.offset));
    if (options.limit !== undefined) query.set('limit', String(options.limit));
    return ok(browse(engine.index(params['uid'] as string), query, options.fields ?? null, options.filter));
  }),
  route('POST', '/indexes/:uid/documents', 'documents.add', write(false), { documents: true }),
  route('PUT', '/indexes/:uid/documents', 'documents.add', write(true), { documents: true }),
  route('DELETE', '/indexes/:uid/documents', 'documents.delete', ({ engine, params }) =>
    accepted(engine.deleteAllDocuments(params['uid'] as string))),
  route('POST', '/indexes/:uid/documents/delete-batch', 'documents.delete', ({ engine, params, body }) => {
    if (!Array.isArray(body) || !body.every((id) => typeof id === 'string' || typeof id === 'number')) {
      throw new ApiError('bad_request', 'A batch deletion body is an array of document ids.');
    }
    return accepted(engine.deleteDocuments(params['uid'] as string, body.map(String)));
  }),
  route('POST', '/indexes/:uid/documents/delete', 'documents.delete', ({ engine, params, body }) => {
    const filter = (body as { filter?: unknown } | undefined)?.filter;
    if (filter === undefined || filter === null) throw new ApiError('missing_document_filter', 'A deletion by filter needs `filter`.');
    return accepted(engine.deleteDocumentsWhere(params['uid'] as string, filter));
  }),
  route('GET', '/indexes/:uid/documents/:id', 'documents.get', ({ engine, params, query }) => {
    const index = engine.index(params['uid'] as string);
    const doc = index.get(params['id'] as string);
    if (doc === undefined) throw new ApiError('document_not_found', `Document \`${params['id']}\` not found.`);
    return ok(shown(index, doc, listParam(query, 'fields')));
  }),
  route('DELETE', '/indexes/:uid/documents/:id', 'documents.delete', ({ engine, params }) =>
    accepted(engine.deleteDocuments(params['uid'] as string, [params['id'] as string]))),
];
