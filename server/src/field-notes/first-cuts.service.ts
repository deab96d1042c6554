import { Inject, Injectable } from '@nestjs/common';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { FieldNoteViews } from './field-note-views.js';
import { FieldNotesRepository } from './field-notes.repository.js';
import type { FieldNoteModel } from './models/field-note.model.js';
import type { FirstCutsModel } from './models/first-cuts.model.js';

export const MAX_FIRST_CUTS_STEPS = 30;

/** The First Cuts series: published guides and safety notes in a curated order, with each reader's progress. */
@Injectable()
export class FirstCutsService {
  constructor(
    @Inject(FieldNotesRepository) private readonly repo: FieldNotesRepository,
    @Inject(FieldNoteViews) private readonly views: FieldNoteViews,
  ) {}

  async series(actor: AuthUser | null): Promise<FirstCutsModel> {
    const notes = await this.views.many(await this.repo.seriesIds(), actor, 'published');
    return {
      steps: notes.map((note, i) => ({ position: i + 1, note })),
      readCount: notes.filter((n) => n.readAt !== null).length,
    };
  }

  /** Replaces the series with these notes, in this order (admins curate it). */
  async setSeries(noteIds: string[]): Promise<FirstCutsModel> {
    const ids = [...new Set(noteIds)];
    if (ids.length !== noteIds.length) throw DomainError.badInput('noteIds', 'A note appears in the series only once.');
    if (ids.length > MAX_FIRST_CUTS_STEPS) throw DomainError.badInput('noteIds', `The series holds at most ${MAX_FIRST_CUTS_STEPS} notes.`);
    const articles = new Map((await this.repo.withAuthors(ids)).map((a) => [a.id, a]));
    for (const id of ids) {
      const article = articles.get(id);
      if (!article) throw DomainError.badInput('noteIds', 'One of those notes does not exist.');
      if (!article.publishedRevisionId) throw DomainError.badInput('noteIds', `"${article.slug}" is not published; publish it before adding it to First Cuts.`);
      if (article.kind === 'FINDING') throw DomainError.badInput('noteIds', `"${article.slug}" is a finding; First Cuts holds guides and safety notes.`);
    }
    await this.repo.replaceSeries(ids);
    return this.series(null);
  }

  /** Marks a published note read (or unread) for the signed-in reader. */
  async markRead(actor: AuthUser, noteId: string, read: boolean): Promise<FieldNoteModel> {
    const article = await this.repo.articles.findOneBy({ id: noteId });
    if (!article?.publishedRevisionId) throw DomainError.notFound('That note');
    if (read) {
      await this.repo.progress.upsert({ userId: actor.id, articleId: noteId, readAt: new Date() }, ['userId', 'articleId']);
    } else {
      await this.repo.progress.delete({ userId: actor.id, articleId: noteId });
    }
    return this.views.one(noteId, actor, 'published');
  }
}
