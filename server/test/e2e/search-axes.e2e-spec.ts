import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { KNOWLEDGE_INDEX_UID } from '@endgrain/shared';
import { Meilisearch } from 'meilisearch';

import { SearchIndexer } from '../../src/search/search-indexer.service.js';
import { lookupIds, demoToken, type Ids } from '../utils/meet-operations.js';
import { addAxe, axeInput, updateAxe } from '../utils/rack-operations.js';
import { createTestApp } from '../utils/test-app.js';

describe("search: the Rack's public axes", () => {
  let app: INestApplication;
  let ids: Ids;
  let coach: string;
  const master = new Meilisearch({ host: process.env.SEARCH_URL ?? 'http://127.0.0.1:7710', apiKey: 'endgrain-dev-search-master-key' });

  /** The ids a search for one word returns, once the outbox has been sent (retrying briefly). */
  async function found(word: string, until: (ids: string[]) => boolean): Promise<string[]> {
    let hits: string[] = [];
    for (let attempt = 0; attempt < 40; attempt += 1) {
      await app.get(SearchIndexer).drain();
      hits = (await master.index(KNOWLEDGE_INDEX_UID).search(word)).hits.map((h) => String(h.id));
      if (until(hits)) return hits;
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    return hits;
  }

  beforeAll(async () => {
    app = await createTestApp();
    ids = await lookupIds(app);
    coach = await demoToken(app, 'coach@example.org');
  });
  afterAll(async () => {
    await app.close();
  });

  it('indexes an axe marked public, leaves a private one out, and removes one that goes private', async () => {
    const word = `Kestrelgrind${Date.now().toString(36)}`;
    const open = await addAxe(app, coach, ids.clubs.LARCH, axeInput({ isPublic: true, notes: `${word} for soft pine` }));
    const closed = await addAxe(app, coach, ids.clubs.LARCH, axeInput({ isPublic: false, notes: `${word} kept at home` }));
    const openId = `axe-${open.data!.addAxe.id}`;
    const closedId = `axe-${closed.data!.addAxe.id}`;

    const hits = await found(word, (h) => h.includes(openId));
    expect(hits).toContain(openId);
    expect(hits).not.toContain(closedId);

    await updateAxe(app, coach, open.data!.addAxe.id, axeInput({ label: open.data!.addAxe.label, isPublic: false, notes: `${word} for soft pine` }));
    expect(await found(word, (h) => !h.includes(openId))).not.toContain(openId);
  });
});
