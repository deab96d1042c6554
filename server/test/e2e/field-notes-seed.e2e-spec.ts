import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { DataSource } from 'typeorm';

import { FIRST_CUTS_SERIES, seedFieldNotes } from '../../src/field-notes/seed-field-notes.js';
import { gql } from '../utils/graphql.js';
import { createTestApp } from '../utils/test-app.js';

describe('seedFieldNotes', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('writes the demo notes once, published, with First Cuts in order', async () => {
    const db = app.get(DataSource);
    await seedFieldNotes(db);
    // A second call finds the notes there and changes nothing.
    await expect(seedFieldNotes(db)).resolves.toBe(false);
    const res = await gql<{ fieldNote: { isPublished: boolean; kind: string; authorName: string; bodyHtml: string } }>(
      app, '{ fieldNote(slug: "chisel-grinds-in-green-aspen") { isPublished kind authorName bodyHtml } }');
    expect(res.data?.fieldNote).toMatchObject({ isPublished: true, kind: 'FINDING', authorName: 'Club Coach (demo)' });
    expect(res.data?.fieldNote.bodyHtml).toContain('<strong>Demo finding.</strong>');
    const rows = await db.query<{ slug: string; position: number }[]>(
      'SELECT a.slug, s.position FROM first_cuts_steps s JOIN articles a ON a.id = s.article_id WHERE a.slug IN (?) ORDER BY s.position',
      [FIRST_CUTS_SERIES.map((n) => n.slug)],
    );
    expect(rows.map((r) => r.slug)).toEqual(FIRST_CUTS_SERIES.map((n) => n.slug));
  });
});
