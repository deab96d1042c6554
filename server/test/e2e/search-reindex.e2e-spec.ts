import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { startSearchFake, type SearchFake } from '@endgrain/search-fake/dist/server.js';
import { KNOWLEDGE_INDEX_UID } from '@endgrain/shared';
import { Meilisearch } from 'meilisearch';

import { DEV_SECRETS } from '../../src/config/env.schema.js';
import { ArticleSearchSource } from '../../src/field-notes/article-search-source.js';
import { FieldNotesRepository } from '../../src/field-notes/field-notes.repository.js';
import { rebuildKnowledgeIndex } from '../../src/search/knowledge-index.js';
import { SearchIndexer } from '../../src/search/search-indexer.service.js';
import { noteInput, publishedNote, uniqueWord } from '../utils/field-notes-operations.js';
import { demoToken } from '../utils/meet-operations.js';
import { createTestApp } from '../utils/test-app.js';

/** A private, empty search service, so these tests never wipe the shared one. */
describe('rebuilding the search index from the database', () => {
  let fake: SearchFake;
  let dataDir: string;
  let client: Meilisearch;
  let app: INestApplication;
  let noteId: string;
  const sharedUrl = process.env.SEARCH_URL;

  beforeAll(async () => {
    dataDir = mkdtempSync(join(tmpdir(), 'endgrain-reindex-'));
    fake = await startSearchFake({ port: 0, dataDir, masterKey: DEV_SECRETS.SEARCH_MASTER_KEY });
    client = new Meilisearch({ host: fake.url, apiKey: DEV_SECRETS.SEARCH_MASTER_KEY });
    const writer = await createTestApp();
    try {
      const [coach, admin] = (await Promise.all(['coach@example.org', 'admin@example.org'].map((e) => demoToken(writer, e)))) as [string, string];
      noteId = (await publishedNote(writer, { coach, admin }, noteInput({ title: `Rebuilt from the record ${uniqueWord('rebuild')}` }))).id;
    } finally {
      await writer.close();
    }
  });
  afterAll(async () => {
    process.env.SEARCH_URL = sharedUrl;
    await app?.close();
    await fake.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('queues every published note when the server starts against an empty index', async () => {
    process.env.SEARCH_URL = fake.url;
    app = await createTestApp();
    process.env.SEARCH_URL = sharedUrl;
    let count = 0;
    for (let attempt = 0; attempt < 60 && count === 0; attempt += 1) {
      await app.get(SearchIndexer).drain();
      count = (await client.index(KNOWLEDGE_INDEX_UID).getStats().catch(() => ({ numberOfDocuments: 0 }))).numberOfDocuments;
      if (count === 0) await new Promise((resolve) => setTimeout(resolve, 250));
    }
    expect(count).toBeGreaterThan(0);
  });

  it('writes every published note again, as npm run reindex does', async () => {
    const db = app.get(FieldNotesRepository).db;
    const published = (await db.query<{ n: string }[]>('SELECT COUNT(*) AS n FROM articles WHERE published_revision_id IS NOT NULL'))[0]!.n;
    const written = await rebuildKnowledgeIndex(client, [new ArticleSearchSource(new FieldNotesRepository(db))]);
    expect(written).toBe(Number(published));
    const stats = await client.index(KNOWLEDGE_INDEX_UID).getStats();
    expect(stats.numberOfDocuments).toBe(written);
    expect((await client.index(KNOWLEDGE_INDEX_UID).getDocument(`article-${noteId}`)).kind).toBe('FINDING');
    const settings = await client.index(KNOWLEDGE_INDEX_UID).getSettings();
    expect(settings.filterableAttributes).toEqual(expect.arrayContaining(['kind', 'species', 'grind', 'event', 'condition']));
  });
});
