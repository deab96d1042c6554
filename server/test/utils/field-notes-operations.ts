import type { INestApplication } from '@nestjs/common';

import { setUserRole, signIn, signUp } from './auth-operations.js';
import { gql } from './graphql.js';
import { demoToken } from './meet-operations.js';
import { freshEmail } from './test-app.js';

export const NOTE_FIELDS = `id slug kind status authorId authorName revisionId revisionNumber isDraftView isPublished hasUnpublishedChanges
  title summary bodyMarkdown bodyHtml tags { species grinds events conditions free }
  evidence { kind refId species grind condition label summary href } publishedAt firstCutsPosition readAt
  canEdit canSubmit canReview canPublish publishRefusal`;

export interface NoteShape {
  id: string;
  slug: string;
  kind: string;
  status: string;
  authorId: string;
  revisionNumber: number;
  isDraftView: boolean;
  isPublished: boolean;
  hasUnpublishedChanges: boolean;
  title: string;
  summary: string;
  bodyMarkdown: string;
  bodyHtml: string;
  tags: { species: string[]; grinds: string[]; events: string[]; conditions: string[]; free: string[] };
  evidence: { kind: string; href: string; label: string; summary: string }[];
  firstCutsPosition: number | null;
  readAt: string | null;
  canEdit: boolean;
  canPublish: boolean;
  publishRefusal: string | null;
}

let counter = 0;
/** A letters-only word no other note contains, so a search can find exactly this test's notes. */
export function uniqueWord(label: string): string {
  counter += 1;
  const letters = `${Date.now().toString(36)}${process.pid.toString(36)}${counter}`.replace(/\d/g, (d) => 'qwertyuiop'[Number(d)] as string);
  return `${label}${letters}`;
}

export function noteInput(over: Record<string, unknown> = {}) {
  return {
    kind: 'FINDING',
    title: 'Chisel grinds on green aspen',
    summary: 'Three seasons of results on green quaking aspen, compared by grind.',
    bodyMarkdown: '## What we saw\n\nChisel grinds ran **faster** on green aspen.',
    tags: { species: ['quaking-aspen'], grinds: ['CHISEL'], events: ['underhand-chop'], conditions: ['GREEN'], free: [] },
    evidence: [{ kind: 'GRAIN_CELL', species: 'quaking-aspen', grind: 'CHISEL', condition: 'GREEN', label: 'Grain Map cell', summary: 'demo numbers' }],
    note: '',
    ...over,
  };
}

export function createNote(app: INestApplication, token: string, input: Record<string, unknown>) {
  return gql<{ createFieldNote: NoteShape }>(app, `mutation($i: FieldNoteInput!) { createFieldNote(input: $i) { ${NOTE_FIELDS} } }`, { i: input }, { token });
}

export function updateNote(app: INestApplication, token: string, id: string, input: Record<string, unknown>) {
  return gql<{ updateFieldNote: NoteShape }>(app, `mutation($id: ID!, $i: FieldNoteInput!) { updateFieldNote(id: $id, input: $i) { ${NOTE_FIELDS} } }`, { id, i: input }, { token });
}

export function noteStep(app: INestApplication, token: string | undefined, step: 'submitFieldNote' | 'publishFieldNote', id: string) {
  return gql<Record<string, NoteShape>>(app, `mutation($id: ID!) { ${step}(id: $id) { ${NOTE_FIELDS} } }`, { id }, { token });
}

export function commentStep(app: INestApplication, token: string, step: 'sendBackFieldNote' | 'unpublishFieldNote', id: string, comment: string) {
  return gql<Record<string, NoteShape>>(app, `mutation($id: ID!, $c: String!) { ${step}(id: $id, comment: $c) { ${NOTE_FIELDS} } }`, { id, c: comment }, { token });
}

export function readNote(app: INestApplication, slug: string, options: { token?: string; draft?: boolean } = {}) {
  return gql<{ fieldNote: NoteShape }>(app, `query($s: String!, $d: Boolean!) { fieldNote(slug: $s, draft: $d) { ${NOTE_FIELDS} } }`, { s: slug, d: options.draft ?? false }, { token: options.token });
}

/** Writes, submits and publishes a note (coach writes, the demo admin publishes). */
export async function publishedNote(app: INestApplication, tokens: { coach: string; admin: string }, input: Record<string, unknown>): Promise<NoteShape> {
  const created = await createNote(app, tokens.coach, input);
  if (!created.data) throw new Error(`create failed: ${JSON.stringify(created.errors)}`);
  const id = created.data.createFieldNote.id;
  const submitted = await noteStep(app, tokens.coach, 'submitFieldNote', id);
  if (!submitted.data) throw new Error(`submit failed: ${JSON.stringify(submitted.errors)}`);
  const published = await noteStep(app, tokens.admin, 'publishFieldNote', id);
  if (!published.data) throw new Error(`publish failed: ${JSON.stringify(published.errors)}`);
  return published.data['publishFieldNote'] as NoteShape;
}

/** A second administrator (fresh account promoted by the demo admin), signed in. */
export async function freshAdminToken(app: INestApplication): Promise<{ token: string; id: string }> {
  const up = await signUp(app, { email: freshEmail('reviewer'), password: 'a sharp second opinion', displayName: 'Odile Fernhollow' });
  const { user } = up.data!.signUp;
  await setUserRole(app, await demoToken(app, 'admin@example.org'), user.id, 'ADMIN');
  const again = await signIn(app, { email: user.email, password: 'a sharp second opinion' }, `10.67.${process.pid % 250}.${(counter += 1) % 250}`);
  return { token: again.data!.signIn.accessToken, id: user.id };
}
