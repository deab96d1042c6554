import type { AddressInfo } from 'node:net';

import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { knowledgeSearchRequest, KNOWLEDGE_INDEX_UID } from '@endgrain/shared';
import { Meilisearch, MeilisearchApiError, type SearchParams } from 'meilisearch';
import request from 'supertest';

import { SearchIndexer } from '../../src/search/search-indexer.service.js';
import { commentStep, noteInput, noteStep, publishedNote, uniqueWord, updateNote } from '../utils/field-notes-operations.js';
import { errorCode, gql } from '../utils/graphql.js';
import { demoToken } from '../utils/meet-operations.js';
import { createTestApp } from '../utils/test-app.js';

interface Hit {
  id: string;
  kind: string;
  species: string[];
  condition: string[];
  [key: string]: unknown;
}

describe('search: indexing published notes and searching them as the browser does', () => {
  let app: INestApplication;
  let coach: string;
  let admin: string;
  let browser: Meilisearch;
  let searchKey: string;

  /** Searches through our relay with the search-only key, draining the outbox first and retrying briefly. */
  async function search(q: string, params: SearchParams, until: (hits: Hit[]) => boolean): Promise<Hit[]> {
    let hits: Hit[] = [];
    for (let attempt = 0; attempt < 40; attempt += 1) {
      await app.get(SearchIndexer).drain();
      hits = (await browser.index(KNOWLEDGE_INDEX_UID).search<Hit>(q, params)).hits;
      if (until(hits)) return hits;
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    return hits;
  }
  const ids = (hits: Hit[]) => hits.map((h) => h.id);

  beforeAll(async () => {
    app = await createTestApp();
    await app.listen(0, '127.0.0.1');
    const { port } = app.getHttpServer().address() as AddressInfo;
    [coach, admin] = (await Promise.all(['coach@example.org', 'admin@example.org'].map((e) => demoToken(app, e)))) as [string, string];
    const config = await request(app.getHttpServer()).get('/api/search/config');
    searchKey = config.body.searchKey;
    browser = new Meilisearch({ host: `http://127.0.0.1:${port}${config.body.url}`, apiKey: searchKey });
  });
  afterAll(async () => {
    await app.close();
  });

  it('hands out the search-only key from the service, which the service refuses for writes', async () => {
    const res = await request(app.getHttpServer()).get('/api/search/config');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ url: '/api/search', searchKey: expect.any(String), indexUid: KNOWLEDGE_INDEX_UID });
    const master = new Meilisearch({ host: process.env.SEARCH_URL!, apiKey: 'endgrain-dev-search-master-key' });
    const listed = (await master.getKeys()).results.find((k) => k.key === res.body.searchKey);
    expect(listed?.actions).toEqual(['search']);
    const direct = new Meilisearch({ host: process.env.SEARCH_URL!, apiKey: res.body.searchKey });
    const write = direct.index(KNOWLEDGE_INDEX_UID).addDocuments([{ id: 'intruder' }]);
    await expect(write).rejects.toBeInstanceOf(MeilisearchApiError);
    await expect(write).rejects.toMatchObject({ cause: { code: 'invalid_api_key' } });
  });

  it('relays only searches of the knowledge index, and adds no key of its own', async () => {
    const other = await request(app.getHttpServer()).post('/api/search/indexes/someone-else/search').set('authorization', `Bearer ${searchKey}`).send({ q: 'x' });
    expect(other.status).toBe(404);
    expect(other.body.code).toBe('index_not_found');
    const keyless = await request(app.getHttpServer()).post(`/api/search/indexes/${KNOWLEDGE_INDEX_UID}/search`).send({ q: 'x' });
    expect(keyless.status).toBe(401);
    expect(keyless.body.code).toBe('missing_authorization_header');
    const write = await request(app.getHttpServer()).post(`/api/search/indexes/${KNOWLEDGE_INDEX_UID}/documents`).set('authorization', `Bearer ${searchKey}`).send([{ id: 'x' }]);
    expect(write.status).toBe(404);
  });

  it('finds poplar findings from a misspelling such as "poplr"', async () => {
    const marker = uniqueWord('typo');
    const note = await publishedNote(app, { coach, admin }, noteInput({ title: `Green aspen under a chisel ${marker}` }));
    // The title never says poplar: the species tag adds it (aspens are poplars), and one typo is forgiven.
    const hits = await search(`poplr ${marker}`, { matchingStrategy: 'all' }, (h) => ids(h).includes(`article-${note.id}`));
    expect(ids(hits)).toContain(`article-${note.id}`);
  });

  it('returns only the chosen species from a filtered search', async () => {
    const marker = uniqueWord('facet');
    const aspen = await publishedNote(app, { coach, admin }, noteInput({ title: `Aspen notes ${marker}` }));
    const pineTags = { species: ['eastern-white-pine'], grinds: ['FLAT'], events: [], conditions: ['DRY'], free: [] };
    const pine = await publishedNote(app, { coach, admin }, noteInput({ title: `Pine notes ${marker}`, tags: pineTags, evidence: [{ kind: 'GRAIN_CELL', species: 'eastern-white-pine', label: 'cell', summary: '' }] }));
    await search(marker, {}, (h) => ids(h).includes(`article-${pine.id}`) && ids(h).includes(`article-${aspen.id}`));
    const { params } = knowledgeSearchRequest(marker, { species: ['quaking-aspen'] });
    const hits = await search(marker, params, (h) => h.length > 0);
    expect(ids(hits)).toEqual([`article-${aspen.id}`]);
    expect(hits.every((h) => h.species.includes('quaking-aspen'))).toBe(true);
  });

  it('replaces the old text in results once a newer revision is published', async () => {
    const before = uniqueWord('before');
    const after = uniqueWord('after');
    const note = await publishedNote(app, { coach, admin }, noteInput({ bodyMarkdown: `The first go said ${before}.` }));
    const id = `article-${note.id}`;
    expect(ids(await search(before, {}, (h) => ids(h).includes(id)))).toContain(id);
    await updateNote(app, coach, note.id, noteInput({ bodyMarkdown: `The second go says ${after}.` }));
    await noteStep(app, coach, 'submitFieldNote', note.id);
    await noteStep(app, admin, 'publishFieldNote', note.id);
    expect(ids(await search(after, {}, (h) => ids(h).includes(id)))).toContain(id);
    expect(ids(await search(before, {}, (h) => !ids(h).includes(id)))).not.toContain(id);
  });

  it('takes a withdrawn note out of the results', async () => {
    const marker = uniqueWord('withdrawn');
    const note = await publishedNote(app, { coach, admin }, noteInput({ title: `Soon withdrawn ${marker}` }));
    await search(marker, {}, (h) => h.length > 0);
    await commentStep(app, admin, 'unpublishFieldNote', note.id, 'Numbers were from the wrong season.');
    expect(await search(marker, {}, (h) => h.length === 0)).toEqual([]);
  });

  it('answers "grind for wet poplar" with a finding on green poplar first', async () => {
    const guideTags = { species: ['quaking-aspen'], grinds: [], events: [], conditions: [], free: ['grind'] };
    await publishedNote(app, { coach, admin }, noteInput({ kind: 'GUIDE', title: 'How to pick a grind', evidence: [], tags: guideTags, bodyMarkdown: 'Poplar and pine want different grinds.' }));
    await publishedNote(app, { coach, admin }, noteInput());
    const { q, params } = knowledgeSearchRequest('Which grind for wet poplar?');
    const [first] = await search(q, params, (h) => h.length > 0);
    expect(first?.kind).toBe('FINDING');
    expect(first?.condition).toContain('GREEN');
    expect(first?.species.some((s) => ['quaking-aspen', 'bigtooth-aspen', 'eastern-cottonwood', 'black-cottonwood', 'balsam-poplar', 'yellow-poplar'].includes(s))).toBe(true);
  });
});

describe('search: a publish while the search service is down', () => {
  it('succeeds at once, is retried, and reaches the index when the service is back', async () => {
    const url = process.env.SEARCH_URL;
    process.env.SEARCH_URL = 'http://127.0.0.1:9';
    const down = await createTestApp();
    process.env.SEARCH_URL = url;
    const up = await createTestApp();
    try {
      const [coach, admin] = (await Promise.all(['coach@example.org', 'admin@example.org'].map((e) => demoToken(down, e)))) as [string, string];
      const marker = uniqueWord('outage');
      const note = await publishedNote(down, { coach, admin }, noteInput({ title: `Published in an outage ${marker}` }));
      expect(note.isPublished).toBe(true);
      await down.get(SearchIndexer).drain();
      const status = await gql<{ searchIndexStatus: { healthy: boolean; lastError: string | null } }>(down, '{ searchIndexStatus { healthy pending failing lastError } }', {}, { token: admin });
      expect(status.data?.searchIndexStatus.healthy).toBe(false);
      expect(errorCode(await gql(down, '{ searchIndexStatus { pending } }', {}, { token: coach }))).toBe('FORBIDDEN');
      const master = new Meilisearch({ host: url!, apiKey: 'endgrain-dev-search-master-key' });
      let found = 0;
      for (let attempt = 0; attempt < 60 && found === 0; attempt += 1) {
        await up.get(SearchIndexer).drain();
        found = (await master.index(KNOWLEDGE_INDEX_UID).search(marker)).hits.length;
        if (found === 0) await new Promise((resolve) => setTimeout(resolve, 250));
      }
      expect(found).toBe(1);
    } finally {
      await down.close();
      await up.close();
    }
  });
});
