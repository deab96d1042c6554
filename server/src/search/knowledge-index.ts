import { KNOWLEDGE_INDEX_SETTINGS, KNOWLEDGE_INDEX_UID, type KnowledgeDocument } from '@endgrain/shared';
import { MeilisearchApiError, type Meilisearch, type Task } from 'meilisearch';

import type { SearchSource } from './search-source.js';

const WAIT = { timeout: 15_000, interval: 50 };

// A failed task resolves rather than throws; treat it as the failure it is.
function succeeded(task: Task, what: string): void {
  if (task.status !== 'succeeded') throw new Error(`${what}: task ${task.uid} ${task.status}${task.error ? ` (${task.error.code}: ${task.error.message})` : ''}`);
}

/** Creates the index if needed and applies its settings (searchable order, facets, stop words). */
export async function applyKnowledgeSettings(client: Meilisearch): Promise<void> {
  succeeded(await client.index(KNOWLEDGE_INDEX_UID).updateSettings(KNOWLEDGE_INDEX_SETTINGS).waitTask(WAIT), 'index settings');
}

/** Writes and removes documents, waiting until the service has applied both. */
export async function writeKnowledgeDocuments(client: Meilisearch, documents: KnowledgeDocument[], gone: string[]): Promise<void> {
  const index = client.index<KnowledgeDocument>(KNOWLEDGE_INDEX_UID);
  if (documents.length) succeeded(await index.addDocuments(documents, { primaryKey: 'id' }).waitTask(WAIT), 'add documents');
  if (gone.length) succeeded(await index.deleteDocuments(gone).waitTask(WAIT), 'delete documents');
}

/** How many documents the index holds; 0 when it does not exist yet. */
export async function knowledgeDocumentCount(client: Meilisearch): Promise<number> {
  try {
    return (await client.index(KNOWLEDGE_INDEX_UID).getStats()).numberOfDocuments;
  } catch (error) {
    if (error instanceof MeilisearchApiError && error.cause?.code === 'index_not_found') return 0;
    throw error;
  }
}

/** Empties the index and writes every source's documents again, from the database. */
export async function rebuildKnowledgeIndex(client: Meilisearch, sources: readonly SearchSource[]): Promise<number> {
  await applyKnowledgeSettings(client);
  succeeded(await client.index(KNOWLEDGE_INDEX_UID).deleteAllDocuments().waitTask(WAIT), 'clear index');
  let written = 0;
  for (const source of sources) {
    const ids = await source.allIds();
    for (let i = 0; i < ids.length; i += 200) {
      const { documents } = await source.documents(ids.slice(i, i + 200));
      await writeKnowledgeDocuments(client, documents, []);
      written += documents.length;
    }
  }
  return written;
}
