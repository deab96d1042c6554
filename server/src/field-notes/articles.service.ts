import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { canEditArticle, canWriteArticles, slugify } from '@endgrain/shared';
import type { EntityManager } from 'typeorm';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { revisionValues, type RevisionValues } from './article-values.js';
import type { FieldNoteInput, FieldNotesFilter } from './dto/field-note.inputs.js';
import { ArticleRevisionEntity } from './entities/article-revision.entity.js';
import { ArticleEntity } from './entities/article.entity.js';
import { FieldNoteViews, mayReadDrafts } from './field-note-views.js';
import { FieldNotesRepository } from './field-notes.repository.js';
import { toReviewModel, toRevisionModel } from './field-notes.mappers.js';
import type { FieldNoteHistoryModel } from './models/field-note-history.model.js';
import type { FieldNoteModel } from './models/field-note.model.js';

const RESERVED_SLUGS = new Set(['new', 'review', 'mine']);

/** Writing and reading Field Notes; every save is a new revision, so history is whole. */
@Injectable()
export class ArticlesService {
  constructor(
    @Inject(FieldNotesRepository) private readonly repo: FieldNotesRepository,
    @Inject(FieldNoteViews) private readonly views: FieldNoteViews,
  ) {}

  async list(filter: FieldNotesFilter, actor: AuthUser | null): Promise<FieldNoteModel[]> {
    const limit = Math.min(100, Math.max(1, filter.limit));
    const ids = await this.repo.publishedIds({ ...filter, limit, offset: Math.max(0, filter.offset) });
    return this.views.many(ids, actor, 'published');
  }

  /** The published note; with `draft`, the working copy for those who may see it. */
  async get(slug: string, draft: boolean, actor: AuthUser | null): Promise<FieldNoteModel> {
    const article = await this.repo.articles.findOneBy({ slug });
    if (!article) throw DomainError.notFound('That note');
    const drafts = mayReadDrafts(actor, article);
    if (!article.publishedRevisionId && !drafts) throw DomainError.notFound('That note');
    const mode = (draft && drafts) || !article.publishedRevisionId ? 'latest' : 'published';
    return this.views.one(article.id, actor, mode);
  }

  async mine(actor: AuthUser): Promise<FieldNoteModel[]> {
    return this.views.many(await this.repo.idsWhere({ authorId: actor.id }), actor, 'latest');
  }

  async reviewQueue(actor: AuthUser): Promise<FieldNoteModel[]> {
    return this.views.many(await this.repo.idsWhere({ status: 'IN_REVIEW' }), actor, 'latest');
  }

  async history(id: string, actor: AuthUser): Promise<FieldNoteHistoryModel> {
    const article = await this.views.editable(id, actor);
    const [revisions, reviews] = await this.repo.history(id);
    const numbers = new Map(revisions.map((r) => [r.id, r.number]));
    return {
      note: await this.views.one(id, actor, 'latest'),
      revisions: revisions.map((r) => toRevisionModel(r, article.publishedRevisionId)),
      reviews: reviews.map((r) => toReviewModel(r, numbers)),
    };
  }

  async create(actor: AuthUser, input: FieldNoteInput): Promise<FieldNoteModel> {
    if (!canWriteArticles(actor)) throw DomainError.forbidden('Coaches and administrators write Field Notes.');
    const values = revisionValues(input);
    const id = randomUUID();
    const slug = await this.uniqueSlug(values.title);
    await this.repo.db.transaction(async (m) => {
      await m.getRepository(ArticleEntity).insert({ id, slug, kind: input.kind, status: 'DRAFT', authorId: actor.id });
      const revisionId = await this.insertRevision(m, id, 1, actor, values);
      await m.getRepository(ArticleEntity).update({ id }, { latestRevisionId: revisionId });
    });
    return this.views.one(id, actor, 'latest');
  }

  /** Saves a new revision. Editing a published note drafts a new version; the public keeps the old until it is published. */
  async update(actor: AuthUser, id: string, input: FieldNoteInput): Promise<FieldNoteModel> {
    const article = await this.repo.articles.findOneBy({ id });
    if (!article) throw DomainError.notFound('That note');
    if (!canEditArticle(actor, article)) {
      throw DomainError.forbidden(article.status === 'IN_REVIEW' ? 'The note is waiting for review; it can be changed again once it is sent back or published.' : 'Only its author or an administrator edits a note.');
    }
    if (input.kind !== article.kind) throw DomainError.badInput('kind', 'A note keeps its kind; start a new note for a different kind.');
    const values = revisionValues(input);
    const latest = article.latestRevisionId ? await this.repo.revisions.findOneBy({ id: article.latestRevisionId }) : null;
    if (latest && sameContent(latest, values)) return this.views.one(id, actor, 'latest');
    await this.repo.db.transaction(async (m) => {
      const number = await this.repo.nextRevisionNumber(m, id);
      const revisionId = await this.insertRevision(m, id, number, actor, values);
      const status = article.status === 'PUBLISHED' ? 'DRAFT' : article.status;
      await m.getRepository(ArticleEntity).update({ id }, { latestRevisionId: revisionId, status });
    });
    return this.views.one(id, actor, 'latest');
  }

  /** Throws away a note that was never published (published ones are withdrawn instead, keeping the record). */
  async deleteDraft(actor: AuthUser, id: string): Promise<boolean> {
    const article = await this.repo.articles.findOneBy({ id });
    if (!article) throw DomainError.notFound('That note');
    if (!canEditArticle(actor, article)) throw DomainError.forbidden('Only its author or an administrator deletes a draft.');
    const everPublished = (await this.repo.reviews.countBy({ articleId: id, action: 'PUBLISHED' })) > 0;
    if (everPublished) throw DomainError.badInput('id', 'This note has been published; withdraw it instead, so its history is kept.');
    await this.repo.articles.delete({ id });
    return true;
  }

  private async insertRevision(m: EntityManager, articleId: string, number: number, actor: AuthUser, v: RevisionValues): Promise<string> {
    const id = randomUUID();
    await m.getRepository(ArticleRevisionEntity).insert({ id, articleId, number, writtenBy: actor.id, ...v });
    return id;
  }

  private async uniqueSlug(title: string): Promise<string> {
    const slug = slugify(title).slice(0, 90);
    // The client's own pages sit beside notes under /field-notes/.
    const base = RESERVED_SLUGS.has(slug) ? `${slug}-note` : slug;
    const taken = await this.repo.slugsStartingWith(base);
    if (!taken.has(base)) return base;
    let n = 2;
    while (taken.has(`${base}-${n}`)) n += 1;
    return `${base}-${n}`;
  }
}

function sameContent(r: ArticleRevisionEntity, v: RevisionValues): boolean {
  return r.title === v.title && r.summary === v.summary && r.bodyMarkdown === v.bodyMarkdown && JSON.stringify(r.tags) === JSON.stringify(v.tags) && JSON.stringify(r.evidence) === JSON.stringify(v.evidence);
}
