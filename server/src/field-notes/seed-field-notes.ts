import { randomUUID } from 'node:crypto';

import { emptyTags } from '@endgrain/shared';
import { DataSource, In, type EntityManager } from 'typeorm';

import { SearchOutboxRepository } from '../search/search-outbox.repository.js';
import { UserEntity } from '../users/entities/user.entity.js';
import { ARTICLE_SEARCH_TYPE } from './article-search-source.js';
import { revisionValues } from './article-values.js';
import type { FieldNoteInput } from './dto/field-note.inputs.js';
import { ArticleReviewEntity } from './entities/article-review.entity.js';
import { ArticleRevisionEntity } from './entities/article-revision.entity.js';
import { ArticleEntity } from './entities/article.entity.js';
import { FirstCutsStepEntity } from './entities/first-cuts-step.entity.js';
import { DEMO_FINDINGS } from './seed/demo-findings.js';
import { FIRST_CUTS_PART_ONE } from './seed/first-cuts-guides.js';
import { FIRST_CUTS_PART_TWO } from './seed/first-cuts-guides-two.js';
import type { SeedNote } from './seed/seed-note.js';

const REVIEWER = 'admin@example.org';
export const FIRST_CUTS_SERIES: readonly SeedNote[] = [...FIRST_CUTS_PART_ONE, ...FIRST_CUTS_PART_TWO];

/**
 * Writes the demo Field Notes: the First Cuts series (published, in order) and the demo
 * findings (written by the demo coaches, published by the demo admin), and queues them for
 * search. Needs the demo accounts; returns false when the notes are already there.
 */
export async function seedFieldNotes(db: DataSource | EntityManager): Promise<boolean> {
  const run = <T>(work: (m: EntityManager) => Promise<T>) => (db instanceof DataSource ? db.transaction(work) : work(db));
  return run(async (m) => {
    if (await m.getRepository(ArticleEntity).existsBy({ slug: FIRST_CUTS_SERIES[0]!.slug })) return false;
    const notes = [...FIRST_CUTS_SERIES, ...DEMO_FINDINGS];
    const emails = [...new Set([REVIEWER, ...notes.map((n) => n.authorEmail)])];
    const users = new Map((await m.getRepository(UserEntity).findBy({ email: In(emails) })).map((u) => [u.email, u.id]));
    const missing = emails.filter((e) => !users.has(e));
    if (missing.length) throw new Error(`seedFieldNotes needs the demo accounts (${missing.join(', ')}); seed the demo league first`);
    const ids: string[] = [];
    for (const note of notes) ids.push(await writeNote(m, note, users.get(note.authorEmail)!, users.get(REVIEWER)!));
    await m.getRepository(FirstCutsStepEntity).insert(FIRST_CUTS_SERIES.map((_, i) => ({ articleId: ids[i]!, position: i + 1 })));
    await new SearchOutboxRepository(m.connection).enqueue(m, ARTICLE_SEARCH_TYPE, ids);
    return true;
  });
}

async function writeNote(m: EntityManager, note: SeedNote, authorId: string, reviewerId: string): Promise<string> {
  const input = {
    kind: note.kind,
    title: note.title,
    summary: note.summary,
    bodyMarkdown: note.body,
    tags: { ...emptyTags(), ...note.tags },
    evidence: (note.evidence ?? []).map((e) => ({ ...e, refId: null })),
    note: '',
  } as unknown as FieldNoteInput;
  const values = revisionValues(input);
  const id = randomUUID();
  const revisionId = randomUUID();
  const publishedAt = new Date(`${note.publishedOn}T15:00:00Z`);
  const submittedAt = new Date(publishedAt.getTime() - 26 * 3600_000);
  await m.getRepository(ArticleEntity).insert({ id, slug: note.slug, kind: note.kind, status: 'PUBLISHED', authorId, publishedAt, createdAt: submittedAt });
  await m.getRepository(ArticleRevisionEntity).insert({ id: revisionId, articleId: id, number: 1, writtenBy: authorId, createdAt: submittedAt, ...values });
  await m.getRepository(ArticleEntity).update({ id }, { latestRevisionId: revisionId, publishedRevisionId: revisionId });
  await m.getRepository(ArticleReviewEntity).insert([
    { id: randomUUID(), articleId: id, revisionId, actorId: authorId, action: 'SUBMITTED', comment: '', createdAt: submittedAt },
    { id: randomUUID(), articleId: id, revisionId, actorId: reviewerId, action: 'PUBLISHED', comment: 'Demo note, published for the demo league.', createdAt: publishedAt },
  ]);
  return id;
}
