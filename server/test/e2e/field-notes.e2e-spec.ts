import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';

import { commentStep, createNote, freshAdminToken, noteInput, noteStep, publishedNote, readNote, updateNote } from '../utils/field-notes-operations.js';
import { errorCode, gql } from '../utils/graphql.js';
import { demoToken } from '../utils/meet-operations.js';
import { createTestApp } from '../utils/test-app.js';

describe('Field Notes: writing, review and publishing', () => {
  let app: INestApplication;
  let coach: string;
  let otherCoach: string;
  let athlete: string;
  let admin: string;
  beforeAll(async () => {
    app = await createTestApp();
    [coach, otherCoach, athlete, admin] = (await Promise.all(
      ['coach@example.org', 'coach.cedarfork@example.org', 'athlete@example.org', 'admin@example.org'].map((e) => demoToken(app, e)),
    )) as [string, string, string, string];
  });
  afterAll(async () => {
    await app.close();
  });

  it('keeps a draft from visitors and other coaches, and shows it to its author', async () => {
    const { data } = await createNote(app, coach, noteInput({ title: 'A draft nobody else sees' }));
    const note = data!.createFieldNote;
    expect(note).toMatchObject({ status: 'DRAFT', isPublished: false, revisionNumber: 1, canEdit: true, canSubmit: true });
    expect(errorCode(await readNote(app, note.slug))).toBe('NOT_FOUND');
    expect(errorCode(await readNote(app, note.slug, { token: otherCoach, draft: true }))).toBe('NOT_FOUND');
    expect((await readNote(app, note.slug, { token: coach, draft: true })).data?.fieldNote.title).toBe('A draft nobody else sees');
  });

  it('stores markdown rendered by the strict renderer, raw HTML printed as text', async () => {
    const body = '<script>alert(1)</script>\n\n[tap](javascript:alert) <img src=x onerror=alert(1)>';
    const { data } = await createNote(app, coach, noteInput({ bodyMarkdown: body }));
    const html = data!.createFieldNote.bodyHtml;
    expect(html).toBe('<p>&lt;script&gt;alert(1)&lt;/script&gt;</p>\n<p>tap &lt;img src=x onerror=alert(1)&gt;</p>');
  });

  it('names the field of a bad tag', async () => {
    const res = await createNote(app, coach, noteInput({ tags: { species: ['not-a-tree'], grinds: [], events: [], conditions: [], free: [] } }));
    expect(res.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'tags.species' });
  });

  it('refuses an athlete writing a note', async () => {
    expect(errorCode(await createNote(app, athlete, noteInput()))).toBe('FORBIDDEN');
  });

  it('asks for evidence before a finding goes to review', async () => {
    const { data } = await createNote(app, coach, noteInput({ evidence: [] }));
    const res = await noteStep(app, coach, 'submitFieldNote', data!.createFieldNote.id);
    expect(res.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'evidence' });
  });

  it('locks a note in review against its author', async () => {
    const { data } = await createNote(app, coach, noteInput());
    const id = data!.createFieldNote.id;
    expect((await noteStep(app, coach, 'submitFieldNote', id)).data?.['submitFieldNote']?.status).toBe('IN_REVIEW');
    expect(errorCode(await updateNote(app, coach, id, noteInput({ title: 'Changed while in review' })))).toBe('FORBIDDEN');
  });

  it('refuses an athlete publishing', async () => {
    const { data } = await createNote(app, coach, noteInput());
    const id = data!.createFieldNote.id;
    await noteStep(app, coach, 'submitFieldNote', id);
    expect(errorCode(await noteStep(app, athlete, 'publishFieldNote', id))).toBe('FORBIDDEN');
  });

  it('refuses a coach publishing their own finding', async () => {
    const { data } = await createNote(app, coach, noteInput());
    const id = data!.createFieldNote.id;
    const submitted = await noteStep(app, coach, 'submitFieldNote', id);
    expect(submitted.data?.['submitFieldNote']).toMatchObject({ canPublish: false, publishRefusal: 'Only a league administrator publishes Field Notes.' });
    expect(errorCode(await noteStep(app, coach, 'publishFieldNote', id))).toBe('FORBIDDEN');
    expect(errorCode(await readNote(app, data!.createFieldNote.slug))).toBe('NOT_FOUND');
  });

  it('refuses an admin publishing a finding they wrote, and lets another admin publish it', async () => {
    const { data } = await createNote(app, admin, noteInput({ title: 'An administrator’s own finding' }));
    const id = data!.createFieldNote.id;
    await noteStep(app, admin, 'submitFieldNote', id);
    const own = await noteStep(app, admin, 'publishFieldNote', id);
    expect(errorCode(own)).toBe('FORBIDDEN');
    expect(own.errors?.[0]?.message).toMatch(/second pair of eyes/);
    const reviewer = await freshAdminToken(app);
    expect((await noteStep(app, reviewer.token, 'publishFieldNote', id)).data?.['publishFieldNote']?.status).toBe('PUBLISHED');
  });

  it('sends a note back only with a comment, and keeps the comment in the review trail', async () => {
    const { data } = await createNote(app, coach, noteInput());
    const id = data!.createFieldNote.id;
    await noteStep(app, coach, 'submitFieldNote', id);
    const bare = await commentStep(app, admin, 'sendBackFieldNote', id, '  ok ');
    expect(bare.errors?.[0]?.extensions).toMatchObject({ code: 'BAD_USER_INPUT', field: 'comment' });
    expect(errorCode(await commentStep(app, coach, 'sendBackFieldNote', id, 'I would rather not publish this'))).toBe('FORBIDDEN');
    const back = await commentStep(app, admin, 'sendBackFieldNote', id, 'Say which meets the times came from.');
    expect(back.data?.['sendBackFieldNote']?.status).toBe('DRAFT');
    const history = await gql<{ fieldNoteHistory: { reviews: { action: string; comment: string; revisionNumber: number }[] } }>(
      app, 'query($id: ID!) { fieldNoteHistory(id: $id) { reviews { action comment revisionNumber } } }', { id }, { token: coach });
    expect(history.data?.fieldNoteHistory.reviews).toEqual([
      { action: 'SENT_BACK', comment: 'Say which meets the times came from.', revisionNumber: 1 },
      { action: 'SUBMITTED', comment: '', revisionNumber: 1 },
    ]);
  });

  it('publishes for visitors, and keeps the published text live while a new revision is drafted', async () => {
    const note = await publishedNote(app, { coach, admin }, noteInput({ title: 'Published then revised' }));
    const visitor = await readNote(app, note.slug);
    expect(visitor.data?.fieldNote).toMatchObject({ isPublished: true, isDraftView: false, canEdit: false, evidence: [expect.objectContaining({ href: '/grain-map?species=quaking-aspen&condition=GREEN&cell=quaking-aspen~CHISEL' })] });
    const revised = await updateNote(app, coach, note.id, noteInput({ title: 'Published then revised, second go', note: 'clearer title' }));
    expect(revised.data?.updateFieldNote).toMatchObject({ status: 'DRAFT', revisionNumber: 2, hasUnpublishedChanges: true, isDraftView: true });
    expect((await readNote(app, note.slug)).data?.fieldNote.title).toBe('Published then revised');
    const history = await gql<{ fieldNoteHistory: { revisions: { number: number; title: string; isPublished: boolean; note: string }[] } }>(
      app, 'query($id: ID!) { fieldNoteHistory(id: $id) { revisions { number title isPublished note } } }', { id: note.id }, { token: coach });
    expect(history.data?.fieldNoteHistory.revisions).toEqual([
      { number: 2, title: 'Published then revised, second go', isPublished: false, note: 'clearer title' },
      { number: 1, title: 'Published then revised', isPublished: true, note: '' },
    ]);
    expect(errorCode(await gql(app, 'query($id: ID!) { fieldNoteHistory(id: $id) { note { id } } }', { id: note.id }, { token: otherCoach }))).toBe('NOT_FOUND');
  });

  it('keeps a note called "Review" from taking the address of the review queue', async () => {
    const { data } = await createNote(app, coach, noteInput({ title: 'Review' }));
    // /field-notes/review is the review queue, so the note gets its own address.
    expect(data?.createFieldNote.slug).toMatch(/^review-note(-\d+)?$/);
  });

  it('saves no new revision when nothing changed', async () => {
    const { data } = await createNote(app, coach, noteInput());
    const again = await updateNote(app, coach, data!.createFieldNote.id, noteInput());
    expect(again.data?.updateFieldNote.revisionNumber).toBe(1);
  });

  it('lists published notes filtered by tag, and withdraws a note with a reason', async () => {
    const note = await publishedNote(app, { coach, admin }, noteInput({ kind: 'GUIDE', title: 'Frozen pine, a guide', evidence: [], tags: { species: ['eastern-white-pine'], grinds: [], events: [], conditions: ['FROZEN'], free: [] } }));
    const list = () => gql<{ fieldNotes: { id: string }[] }>(app, '{ fieldNotes(filter: { condition: "FROZEN", kind: GUIDE, limit: 100 }) { id } }');
    expect((await list()).data?.fieldNotes.map((n) => n.id)).toContain(note.id);
    const withdrawn = await commentStep(app, admin, 'unpublishFieldNote', note.id, 'Superseded by the winter safety note.');
    expect(withdrawn.data?.['unpublishFieldNote']).toMatchObject({ isPublished: false, status: 'DRAFT' });
    expect((await list()).data?.fieldNotes.map((n) => n.id)).not.toContain(note.id);
  });

  it('deletes a draft that was never published, but not a published one', async () => {
    const { data } = await createNote(app, coach, noteInput());
    const del = (id: string) => gql<{ deleteFieldNoteDraft: boolean }>(app, 'mutation($id: ID!) { deleteFieldNoteDraft(id: $id) }', { id }, { token: coach });
    expect((await del(data!.createFieldNote.id)).data?.deleteFieldNoteDraft).toBe(true);
    const published = await publishedNote(app, { coach, admin }, noteInput());
    expect((await del(published.id)).errors?.[0]?.extensions?.field).toBe('id');
  });
});
