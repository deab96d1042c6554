import { ApiError } from './api-error.js';
import { compileFilter } from './compile-filter.js';
import { filterablePatterns } from './index-settings.js';
import { runSearch, type SearchResponse } from './run-search.js';
import { SearchIndex, type IndexInfo, type IndexSnapshot } from './search-index.js';
import { parseSearchParams } from './search-params.js';
import { TaskQueue, type EnqueuedTask, type TaskQueueSnapshot } from './task-queue.js';

export interface EngineSnapshot {
  version: 1;
  createdAt: string;
  tasks: TaskQueueSnapshot;
  indexes: IndexSnapshot[];
}

const INDEX_UID = /^[A-Za-z0-9_-]{1,400}$/;

export function checkIndexUid(uid: unknown): string {
  if (typeof uid !== 'string' || !INDEX_UID.test(uid)) {
    throw new ApiError('invalid_index_uid', `Index uid ${JSON.stringify(uid)} is not 1 to 400 letters, digits, - or _.`);
  }
  return uid;
}

/** Every index and the task queue: reads answer at once, writes go through tasks. */
export class Engine {
  readonly createdAt: string;
  readonly tasks: TaskQueue;
  private readonly indexes = new Map<string, SearchIndex>();

  constructor(options: { taskDelayMs: number; onChange: () => void; snapshot: EngineSnapshot | null }) {
    this.tasks = new TaskQueue({ delayMs: options.taskDelayMs, onSettled: options.onChange });
    this.createdAt = options.snapshot?.createdAt ?? new Date().toISOString();
    if (options.snapshot !== null) {
      this.tasks.restore(options.snapshot.tasks);
      for (const saved of options.snapshot.indexes) this.indexes.set(saved.uid, SearchIndex.fromSnapshot(saved));
    }
  }

  index(uid: string): SearchIndex {
    const index = this.indexes.get(uid);
    if (index === undefined) throw new ApiError('index_not_found', `Index \`${uid}\` not found.`);
    return index;
  }

  listIndexes(): IndexInfo[] {
    return [...this.indexes.values()].map((index) => index.info()).sort((a, b) => (a.uid < b.uid ? -1 : 1));
  }

  createIndex(uid: string, primaryKey: string | null): EnqueuedTask {
    return this.tasks.enqueue('indexCreation', checkIndexUid(uid), { primaryKey }, () => {
      if (this.indexes.has(uid)) throw new ApiError('index_already_exists', `Index \`${uid}\` already exists.`);
      this.indexes.set(uid, new SearchIndex(uid, primaryKey, new Date().toISOString()));
    });
  }

  updateIndex(uid: string, primaryKey: string | null): EnqueuedTask {
    return this.tasks.enqueue('indexUpdate', uid, { primaryKey }, () => {
      const index = this.index(uid);
      if (primaryKey !== null && index.size > 0 && index.primaryKey !== primaryKey) {
        throw new ApiError('index_primary_key_already_exists', `Index \`${uid}\` has documents: its primary key stays \`${index.primaryKey}\`.`);
      }
      if (primaryKey !== null) index.primaryKey = primaryKey;
      index.updatedAt = new Date().toISOString();
    });
  }

  deleteIndex(uid: string): EnqueuedTask {
    return this.tasks.enqueue('indexDeletion', uid, { deletedDocuments: null }, () => {
      const deletedDocuments = this.index(uid).size;
      this.indexes.delete(uid);
      return { deletedDocuments };
    });
  }

  updateSettings(uid: string, patch: Record<string, unknown>): EnqueuedTask {
    return this.tasks.enqueue('settingsUpdate', checkIndexUid(uid), { ...patch }, () => {
      this.ensureIndex(uid, null, (index) => index.updateSettings(patch, new Date().toISOString()));
    });
  }

  addDocuments(uid: string, docs: unknown[], options: { primaryKey?: string; merge: boolean }): EnqueuedTask {
    const details = { receivedDocuments: docs.length, indexedDocuments: null };
    return this.tasks.enqueue('documentAdditionOrUpdate', checkIndexUid(uid), details, () => {
      const indexedDocuments = this.ensureIndex(uid, null, (index) =>
        index.upsert(docs, { ...options, now: new Date().toISOString() }));
      return { indexedDocuments };
    });
  }

  deleteDocuments(uid: string, ids: string[]): EnqueuedTask {
    const details = { providedIds: ids.length, deletedDocuments: null, originalFilter: null };
    return this.tasks.enqueue('documentDeletion', uid, details, () => ({
      deletedDocuments: this.index(uid).delete({ ids }, new Date().toISOString()),
    }));
  }

  deleteDocumentsWhere(uid: string, filter: unknown): EnqueuedTask {
    const details = { providedIds: 0, deletedDocuments: null, originalFilter: JSON.stringify(filter) };
    return this.tasks.enqueue('documentDeletion', uid, details, () => {
      const index = this.index(uid);
      const where = compileFilter(filter, filterablePatterns(index.settings), 'invalid_document_filter');
      if (where === null) throw new ApiError('invalid_document_filter', 'A deletion by filter needs a non-empty filter.');
      return { deletedDocuments: index.delete({ where }, new Date().toISOString()) };
    });
  }

  deleteAllDocuments(uid: string): EnqueuedTask {
    const details = { providedIds: 0, deletedDocuments: null, originalFilter: null };
    return this.tasks.enqueue('documentDeletion', uid, details, () => ({
      deletedDocuments: this.index(uid).clear(new Date().toISOString()),
    }));
  }

  search(uid: string, body: unknown): SearchResponse {
    const index = this.index(uid);
    return runSearch(index, parseSearchParams(body));
  }

  multiSearch(body: unknown): { results: SearchResponse[] } {
    const queries = (body as { queries?: unknown } | null)?.queries;
    if ((body as { federation?: unknown } | null)?.federation != null) {
      throw new ApiError('bad_request', 'Federated multi-search is not offered by the local search service; send separate queries.');
    }
    if (!Array.isArray(queries)) throw new ApiError('bad_request', 'A multi-search body is `{"queries": [...]}`.');
    return {
      results: queries.map((query: unknown, i) => {
        try {
          const indexUid = (query as { indexUid?: unknown } | null)?.indexUid;
          if (typeof indexUid !== 'string') throw new ApiError('missing_index_uid', 'Each query names its `indexUid`.');
          return { indexUid, ...this.search(indexUid, query) };
        } catch (error) {
          const apiError = ApiError.from(error);
          throw new ApiError(apiError.code, `Inside \`.queries[${i}]\`: ${apiError.message}`, apiError.status);
        }
      }),
    };
  }

  toSnapshot(): EngineSnapshot {
    return {
      version: 1,
      createdAt: this.createdAt,
      tasks: this.tasks.toSnapshot(),
      indexes: [...this.indexes.values()].map((index) => index.toSnapshot()),
    };
  }

  /** Writing to a missing index creates it; if the write then fails, the new index goes again. */
  private ensureIndex<T>(uid: string, primaryKey: string | null, write: (index: SearchIndex) => T): T {
    const existing = this.indexes.get(uid);
    const index = existing ?? new SearchIndex(uid, primaryKey, new Date().toISOString());
    if (existing === undefined) this.indexes.set(uid, index);
    try {
      return write(index);
    } catch (error) {
      if (existing === undefined) this.indexes.delete(uid);
      throw error;
    }
  }
}
