import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { noteInput, publishedNote, type NoteShape } from '../utils/field-notes-operations.js';
import { errorCode, gql } from '../utils/graphql.js';
import { demoToken } from '../utils/meet-operations.js';
import { createTestApp } from '../utils/test-app.js';

interface Series {
  steps: { position: number; note: { id: string; readAt: string | null } }[];
  readCount: number;
}
const SERIES = 'steps { position note { id readAt } } readCount';

describe('First Cuts: the ordered series and reading progress', () => {
  let app: INestApplication;
  let coach: string;
  let athlete: string;
  let admin: string;
  let original: string[];
  let guides: NoteShape[];

  const series = (token?: string) => gql<{ firstCuts: Series }>(app, `{ firstCuts { ${SERIES} } }`, {}, { token });
  const setSeries = (token: string, noteIds: string[]) =>
    gql<{ setFirstCuts: Series }>(app, `mutation($ids: [ID!]!) { setFirstCuts(noteIds: $ids) { ${SERIES} } }`, { ids: noteIds }, { token });
  const markRead = (token: string, id: string, read: boolean) =>
    gql<{ markFieldNoteRead: { readAt: string | null } }>(app, 'mutation($id: ID!, $r: Boolean!) { markFieldNoteRead(id: $id, read: $r) { readAt } }', { id, r: read }, { token });

  beforeAll(async () => {
    app = await createTestApp();
    [coach, athlete, admin] = (await Promise.all(['coach@example.org', 'athlete@example.org', 'admin@example.org'].map((e) => demoToken(app, e)))) as [string, string, string];
    // The test database is shared: remember the demo series and put it back afterwards.
    original = (await series()).data!.firstCuts.steps.map((s) => s.note.id);
    guides = [];
    for (const title of ['Boots before blades', 'Reading a block face']) {
      guides.push(await publishedNote(app, { coach, admin }, noteInput({ kind: 'GUIDE', title, evidence: [] })));
    }
  });
  afterAll(async () => {
    await setSeries(admin, original);
    await app.close();
  });

  it('puts published guides in the order the admin gives', async () => {
    const ids = [guides[1]!.id, guides[0]!.id];
    const res = await setSeries(admin, [...original, ...ids]);
    const tail = res.data!.setFirstCuts.steps.slice(-2);
    expect(tail.map((s) => s.note.id)).toEqual(ids);
    expect(tail.map((s) => s.position)).toEqual([original.length + 1, original.length + 2]);
  });

  it('refuses a finding, a draft or a repeated note in the series, and a coach curating it', async () => {
    const finding = await publishedNote(app, { coach, admin }, noteInput());
    expect((await setSeries(admin, [finding.id])).errors?.[0]?.message).toMatch(/is a finding/);
    expect((await setSeries(admin, [guides[0]!.id, guides[0]!.id])).errors?.[0]?.extensions?.field).toBe('noteIds');
    expect(errorCode(await setSeries(coach, [guides[0]!.id]))).toBe('FORBIDDEN');
  });

  it("keeps each reader's progress: read, counted, and unread again", async () => {
    await setSeries(admin, [...original, guides[0]!.id, guides[1]!.id]);
    const before = (await series(athlete)).data!.firstCuts.readCount;
    expect((await markRead(athlete, guides[0]!.id, true)).data?.markFieldNoteRead.readAt).not.toBeNull();
    const after = (await series(athlete)).data!.firstCuts;
    expect(after.readCount).toBe(before + 1);
    expect(after.steps.find((s) => s.note.id === guides[0]!.id)?.note.readAt).not.toBeNull();
    // Another reader's progress is their own.
    expect((await series(coach)).data!.firstCuts.steps.find((s) => s.note.id === guides[0]!.id)?.note.readAt).toBeNull();
    expect((await markRead(athlete, guides[0]!.id, false)).data?.markFieldNoteRead.readAt).toBeNull();
    expect((await series(athlete)).data!.firstCuts.readCount).toBe(before);
  });

  it('asks a visitor to sign in before keeping progress', async () => {
    const res = await gql(app, 'mutation($id: ID!) { markFieldNoteRead(id: $id) { readAt } }', { id: guides[0]!.id });
    expect(errorCode(res)).toBe('UNAUTHENTICATED');
  });
});
