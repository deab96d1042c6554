import { describe, expect, it } from '@jest/globals';

import { rejection, useTestFake } from '../testing/start-test-fake.js';

// Every check here goes through the official SDK, as the server and client will.
const t = useTestFake();

describe('documents', () => {
  const index = () => t().client.index('notes');

  it('adds with a primary key, gets one, and updates part of a document', async () => {
    await index().addDocuments([{ ref: 'n-1', title: 'Rehang after a loose head', grind: 'convex' }], { primaryKey: 'ref' }).waitTask();
    expect(await index().getDocument('n-1')).toEqual({ ref: 'n-1', title: 'Rehang after a loose head', grind: 'convex' });
    await index().updateDocuments([{ ref: 'n-1', grind: 'flat' }]).waitTask();
    expect(await index().getDocument('n-1')).toEqual({ ref: 'n-1', title: 'Rehang after a loose head', grind: 'flat' });
    expect((await t().client.getRawIndex('notes')).primaryKey).toBe('ref');
  });

  it('answers 404 document_not_found for a missing document', async () => {
    const error = await rejection(index().getDocument('n-404'));
    expect(error.response?.status).toBe(404);
    expect(error.cause?.code).toBe('document_not_found');
  });

  it('deletes one, a batch, and all documents', async () => {
    await index().addDocuments([{ ref: 'n-2' }, { ref: 'n-3' }, { ref: 'n-4' }, { ref: 'n-5' }]).waitTask();
    await index().deleteDocument('n-2').waitTask();
    const batch = await index().deleteDocuments(['n-3', 'n-4']).waitTask();
    // hand-worked: n-3 and n-4 were both present, so both go.
    expect(batch.details?.deletedDocuments).toBe(2);
    expect((await index().getDocuments()).results.map((doc) => doc['ref']).sort()).toEqual(['n-1', 'n-5']);
    await index().deleteAllDocuments().waitTask();
    expect((await index().getDocuments()).total).toBe(0);
  });

  it('fails the task for a document without its primary key or with a bad id', async () => {
    const missing = await index().addDocuments([{ title: 'no ref' }]).waitTask();
    expect(missing.status).toBe('failed');
    expect(missing.error?.code).toBe('missing_document_id');
    const bad = await index().addDocuments([{ ref: 'has space' }]).waitTask();
    expect(bad.error?.code).toBe('invalid_document_id');
  });

  it('infers the primary key from the one attribute ending in id', async () => {
    await t().client.index('inferred').addDocuments([{ trialId: 7, species: 'aspen' }]).waitTask();
    expect((await t().client.getRawIndex('inferred')).primaryKey).toBe('trialId');
  });

  it('answers malformed JSON with 400 malformed_payload', async () => {
    const error = await rejection(index().addDocumentsFromString('[{"ref": "n-9",', 'application/json'));
    expect(error.response?.status).toBe(400);
    expect(error.cause?.code).toBe('malformed_payload');
  });
});

