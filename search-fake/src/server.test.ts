import { describe, expect, it } from '@jest/globals';
import { MeilisearchApiError } from 'meilisearch';

import { rejection, startTestFake, useTestFake } from './testing/start-test-fake.js';

// Every check here goes through the official SDK, as the server and client will.
const t = useTestFake();

describe('health and keys', () => {
  it('answers health without any key', async () => {
    expect(await t().clientWith(undefined).health()).toEqual({ status: 'available' });
  });

  it('lists the default search and admin keys by their service names', async () => {
    const { results, total } = await t().client.getKeys();
    // Contract: the two default key names the SDK users look up.
    expect(results.map((key) => key.name).sort()).toEqual(['Default Admin API Key', 'Default Search API Key']);
    expect(total).toBe(2);
    const search = results.find((key) => key.name === 'Default Search API Key');
    expect(search?.actions).toEqual(['search']);
    expect(search?.key).toMatch(/^[0-9a-f]{64}$/);
  });

  it('derives the same keys again after a restart', async () => {
    const before = (await t().client.getKeys()).results.map((key) => key.key);
    await t().restart();
    const after = (await t().client.getKeys()).results.map((key) => key.key);
    expect(after).toEqual(before);
  });
});

describe('authorisation', () => {
  it('refuses a request without a key with 401 missing_authorization_header', async () => {
    const error = await rejection(t().clientWith(undefined).getIndexes());
    expect(error).toBeInstanceOf(MeilisearchApiError);
    expect(error.response?.status).toBe(401);
    expect(error.cause?.code).toBe('missing_authorization_header');
  });

  it('refuses a wrong key with 403 invalid_api_key', async () => {
    const error = await rejection(t().clientWith('not-the-key').getIndexes());
    expect(error.response?.status).toBe(403);
    expect(error.cause?.code).toBe('invalid_api_key');
    expect(error.cause?.type).toBe('auth');
  });

  it('lets the search-only key search but not write', async () => {
    await t().client.index('auth-check').addDocuments([{ id: 1, title: 'Hone before every heat' }]).waitTask();
    const searchKey = (await t().client.getKeys()).results.find((key) => key.name === 'Default Search API Key')?.key;
    const searcher = t().clientWith(searchKey);
    const found = await searcher.index('auth-check').search('hone');
    expect(found.hits.map((hit) => hit['id'])).toEqual([1]);
    for (const write of [
      () => searcher.createIndex('by-search-key'),
      () => searcher.index('auth-check').addDocuments([{ id: 2, title: 'x' }]),
      () => searcher.index('auth-check').updateSettings({ filterableAttributes: ['title'] }),
      () => searcher.index('auth-check').deleteDocument(1),
      () => searcher.getRawIndex('auth-check'),
    ]) {
      const error = await rejection(write());
      expect(error.response?.status).toBe(403);
      expect(error.cause?.code).toBe('invalid_api_key');
    }
  });

  it('lets the admin key write', async () => {
    const adminKey = (await t().client.getKeys()).results.find((key) => key.name === 'Default Admin API Key')?.key;
    const task = await t().clientWith(adminKey).createIndex('by-admin-key').waitTask();
    expect(task.status).toBe('succeeded');
  });
});

describe('indexes and tasks', () => {
  it('creates an index through a task and reports it with ISO dates', async () => {
    const enqueued = await t().client.createIndex('racks', { primaryKey: 'axeId' });
    expect(enqueued).toMatchObject({ indexUid: 'racks', status: 'enqueued', type: 'indexCreation' });
    const task = await t().client.tasks.waitForTask(enqueued.taskUid);
    expect(task).toMatchObject({ uid: enqueued.taskUid, status: 'succeeded', error: null, type: 'indexCreation' });
    expect(Date.parse(task.finishedAt as string)).toBeGreaterThanOrEqual(Date.parse(task.enqueuedAt));
    const info = await t().client.getRawIndex('racks');
    expect(info).toMatchObject({ uid: 'racks', primaryKey: 'axeId' });
    expect(new Date(info.createdAt).toISOString()).toBe(info.createdAt);
    expect((await t().client.getRawIndexes()).results.map((index) => index.uid)).toContain('racks');
  });

  it('fails the task, not the request, when the index already exists', async () => {
    const task = await t().client.createIndex('racks').waitTask();
    expect(task.status).toBe('failed');
    expect(task.error?.code).toBe('index_already_exists');
    expect(Object.keys(task.error ?? {}).sort()).toEqual(['code', 'link', 'message', 'type']);
  });

  it('numbers tasks one after another across indexes', async () => {
    const first = await t().client.createIndex('seq-a');
    const second = await t().client.index('seq-b').addDocuments([{ id: 1 }]);
    expect(second.taskUid).toBe(first.taskUid + 1);
    expect((await t().client.tasks.waitForTask(second.taskUid)).status).toBe('succeeded');
  });

  it('deletes an index, and later reads answer 404 index_not_found', async () => {
    await t().client.createIndex('short-lived').waitTask();
    expect((await t().client.deleteIndex('short-lived').waitTask()).status).toBe('succeeded');
    const error = await rejection(t().client.getIndex('short-lived'));
    expect(error.response?.status).toBe(404);
    expect(error.cause?.code).toBe('index_not_found');
    const again = await t().client.deleteIndex('short-lived').waitTask();
    expect(again.error?.code).toBe('index_not_found');
  });

  it('answers 404 task_not_found for an unknown task', async () => {
    const error = await rejection(t().client.tasks.getTask(999_999));
    expect(error.cause?.code).toBe('task_not_found');
  });
});

describe('answers are always JSON', () => {
  it('answers an unknown route with a JSON 404', async () => {
    const error = await rejection(t().client.httpRequest.get({ path: 'no/such/route' }));
    expect(error).toBeInstanceOf(MeilisearchApiError);
    expect(error.response?.status).toBe(404);
    expect(error.cause?.code).toBe('route_not_found');
  });

  it('answers a malformed settings body with 400 bad_request', async () => {
    const error = await rejection(t().client.httpRequest.patch({ path: 'indexes/tuned/settings', body: '{"stopWords": [', contentType: 'application/json' }));
    expect(error.response?.status).toBe(400);
    expect(error.cause?.code).toBe('bad_request');
  });
});

describe('persistence', () => {
  it('keeps documents, settings and task numbering across a restart', async () => {
    const index = t().client.index('kept');
    await index.updateSettings({ filterableAttributes: ['species'] }).waitTask();
    const last = await index.addDocuments([{ id: 'k-1', title: 'Basswood for first cuts', species: 'basswood' }]).waitTask();
    await t().restart();
    expect(await t().client.index('kept').getDocument('k-1')).toMatchObject({ species: 'basswood' });
    expect(await t().client.index('kept').getFilterableAttributes()).toEqual(['species']);
    const found = await t().client.index('kept').search('basswod', { filter: 'species = basswood' });
    expect(found.hits).toHaveLength(1);
    const next = await t().client.createIndex('after-restart');
    expect(next.taskUid).toBeGreaterThan(last.uid);
  });

  it('applies writes still waiting when it is closed', async () => {
    await t().client.index('late').addDocuments([{ id: 1, title: 'Sheath every edge' }]);
    await t().restart();
    expect(await t().client.index('late').getDocument(1)).toMatchObject({ title: 'Sheath every edge' });
  });
});

describe('writes are asynchronous', () => {
  it('does not show a document before its task has succeeded', async () => {
    // A long task delay makes "before the task ran" certain rather than a race.
    const slow = await startTestFake({ taskDelayMs: 400 });
    try {
      const index = slow.client.index('pending');
      await index.addDocuments([{ id: 1, title: 'Poplar on a wet morning' }]).waitTask({ timeout: 5000 });
      const promise = index.addDocuments([{ id: 2, title: 'Poplar in late frost' }]);
      const enqueued = await promise;
      expect((await slow.client.tasks.getTask(enqueued.taskUid)).status).toBe('enqueued');
      expect((await index.search('poplar')).hits.map((hit) => hit['id'])).toEqual([1]);
      await promise.waitTask({ timeout: 5000 });
      expect((await index.search('poplar')).hits.map((hit) => hit['id']).sort()).toEqual([1, 2]);
    } finally {
      await slow.stop();
    }
  });
});
