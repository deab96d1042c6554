import type { KnowledgeDocument } from '@endgrain/shared';

/** One kind of thing the search index mirrors (published notes now; public Rack axes later). */
export interface SearchSource {
  /** The outbox's doc_type for this source. */
  readonly type: string;
  /** Current documents for these ids, and the document ids to remove (no longer public). */
  documents(ids: string[]): Promise<{ documents: KnowledgeDocument[]; gone: string[] }>;
  /** Every id that should be in the index, for a full rebuild. */
  allIds(): Promise<string[]>;
}
