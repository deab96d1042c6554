import 'reflect-metadata';

import { Meilisearch } from 'meilisearch';

import { loadConfig } from '../config/load-config.js';
import { createDataSource } from '../database/data-source.js';
import { ArticleSearchSource } from '../field-notes/article-search-source.js';
import { FieldNotesRepository } from '../field-notes/field-notes.repository.js';
import { AxeSearchSource } from '../rack/axe-search-source.js';
import { RackRepository } from '../rack/rack.repository.js';
import { rebuildKnowledgeIndex } from './knowledge-index.js';

// npm run reindex: rebuilds the knowledge index from MariaDB (the database is the record; the index a copy).
// Rows still in the outbox are left alone: sending them again later is harmless.
const config = loadConfig();
const db = createDataSource(config);
await db.initialize();
try {
  const client = new Meilisearch({ host: config.SEARCH_URL, apiKey: config.SEARCH_MASTER_KEY, timeout: 10_000 });
  const written = await rebuildKnowledgeIndex(client, [new ArticleSearchSource(new FieldNotesRepository(db)), new AxeSearchSource(new RackRepository(db))]);
  console.log(`reindexed ${written} document(s) into ${config.SEARCH_URL}`);
} catch (error) {
  console.error(`reindex failed (is the search service at ${config.SEARCH_URL} running?): ${error instanceof Error ? error.message : String(error)}`);
  process.exitCode = 1;
} finally {
  await db.destroy();
}
