import { ApiError } from './api-error.js';
import { stringPaths, type Doc } from './document-path.js';
import type { Predicate } from './filter-predicate.js';
import { applySettingsPatch, defaultSettings, type IndexSettings } from './index-settings.js';
import { inferPrimaryKey, validDocumentId } from './primary-key.js';
import { TextIndex } from './text-index.js';

export interface IndexInfo {
  uid: string;
  primaryKey: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface IndexSnapshot extends IndexInfo {
  settings: IndexSettings;
  stringPaths: string[];
  documents: Doc[];
}

function isDoc(value: unknown): value is Doc {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** One index: its documents in insertion order, its settings and its full-text index. */
export class SearchIndex {
  primaryKey: string | null;
  settings: IndexSettings = defaultSettings();
  updatedAt: string;
  readonly createdAt: string;
  readonly text = new TextIndex((doc) => this.idOf(doc));
  // Map order is insertion order; replacing a document keeps its place, which breaks ranking ties.
  private readonly docs = new Map<string, Doc>();
  private readonly order = new Map<string, number>();
  private nextOrder = 0;
  private seenPaths: string[] = [];

  constructor(readonly uid: string, primaryKey: string | null, now: string) {
    this.primaryKey = primaryKey;
    this.createdAt = now;
    this.updatedAt = now;
  }

  get size(): number {
    return this.docs.size;
  }

  info(): IndexInfo {
    return { uid: this.uid, primaryKey: this.primaryKey, createdAt: this.createdAt, updatedAt: this.updatedAt };
  }

  documents(): IterableIterator<Doc> {
    return this.docs.values();
  }

  get(id: string): Doc | undefined {
    return this.docs.get(id);
  }

  /** Insertion rank of a document, kept when it is replaced: the last ranking tie-break. */
  orderOf(id: string): number {
    return this.order.get(id) ?? Number.MAX_SAFE_INTEGER;
  }

  idOf(doc: Doc): string {
    return String(doc[this.primaryKey as string]);
  }

  /** Adds or replaces documents (`merge` keeps the fields a partial document leaves out); all or nothing. */
  upsert(batch: unknown[], options: { primaryKey?: string; merge: boolean; now: string }): number {
    const key = this.resolvePrimaryKey(batch, options.primaryKey);
    const incoming: Doc[] = batch.map((doc) => {
      if (!isDoc(doc)) throw new ApiError('malformed_payload', 'Each document is a JSON object.');
      if (doc[key] === undefined) throw new ApiError('missing_document_id', `A document has no \`${key}\` (the primary key): ${JSON.stringify(doc).slice(0, 200)}`);
      if (!validDocumentId(doc[key])) {
        throw new ApiError('invalid_document_id', `Document id ${JSON.stringify(doc[key])} is neither a non-negative integer nor a string of letters, digits, - and _ (at most 511 bytes).`);
      }
      return doc;
    });
    // Settled only once the whole batch is known good, so a failed task leaves the index as it was.
    this.primaryKey = key;
    for (const doc of incoming) stringPaths(doc, '', this.seenPaths);
    const fields = this.searchableFields();
    const sameFields = fields.length === this.text.searchableFields.length
      && fields.every((field, i) => field === this.text.searchableFields[i]);
    for (const doc of incoming) {
      const id = this.idOf(doc);
      const old = this.docs.get(id);
      const next = options.merge && old !== undefined ? { ...old, ...doc } : doc;
      if (sameFields && old !== undefined) this.text.remove(old);
      this.store(id, next);
      if (sameFields) this.text.add(next);
    }
    if (!sameFields) this.text.useFields(fields, this.docs.values());
    this.updatedAt = options.now;
    return incoming.length;
  }

  /** Deletes documents by id or by predicate; returns how many went. */
  delete(which: { ids: string[] } | { where: Predicate }, now: string): number {
    const ids = 'ids' in which ? which.ids : [...this.docs].filter(([, doc]) => which.where(doc)).map(([id]) => id);
    let deleted = 0;
    for (const id of ids) {
      const old = this.docs.get(id);
      if (old === undefined) continue;
      this.text.remove(old);
      this.docs.delete(id);
      this.order.delete(id);
      deleted += 1;
    }
    this.updatedAt = now;
    return deleted;
  }

  clear(now: string): number {
    const count = this.docs.size;
    this.docs.clear();
    this.order.clear();
    this.text.clear();
    this.updatedAt = now;
    return count;
  }

  updateSettings(patch: Record<string, unknown>, now: string): void {
    this.settings = applySettingsPatch(this.settings, patch);
    this.text.useFields(this.searchableFields(), this.docs.values());
    this.updatedAt = now;
  }

  /** Searchable attributes in rank order: as set, or every string field in order of first appearance. */
  searchableFields(): string[] {
    const listed = this.settings.searchableAttributes;
    return listed.includes('*') ? [...this.seenPaths] : [...listed];
  }

  toSnapshot(): IndexSnapshot {
    return { ...this.info(), settings: this.settings, stringPaths: this.seenPaths, documents: [...this.docs.values()] };
  }

  static fromSnapshot(snapshot: IndexSnapshot): SearchIndex {
    const index = new SearchIndex(snapshot.uid, snapshot.primaryKey, snapshot.createdAt);
    index.settings = { ...defaultSettings(), ...snapshot.settings };
    index.seenPaths = [...snapshot.stringPaths];
    for (const doc of snapshot.documents) index.store(index.idOf(doc), doc);
    index.text.useFields(index.searchableFields(), index.docs.values());
    index.updatedAt = snapshot.updatedAt;
    return index;
  }

  private store(id: string, doc: Doc): void {
    if (!this.order.has(id)) {
      this.order.set(id, this.nextOrder);
      this.nextOrder += 1;
    }
    this.docs.set(id, doc);
  }

  private resolvePrimaryKey(batch: unknown[], requested: string | undefined): string {
    if (this.primaryKey === null) return requested ?? inferPrimaryKey(batch.find(isDoc));
    if (requested === undefined || requested === this.primaryKey) return this.primaryKey;
    if (this.docs.size > 0) {
      throw new ApiError('index_primary_key_already_exists', `Index \`${this.uid}\` already has the primary key \`${this.primaryKey}\`.`);
    }
    return requested;
  }
}
