import { Inject, Injectable } from '@nestjs/common';
import { canEditArticle, canReviewArticles } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import type { ArticleEntity } from './entities/article.entity.js';
import { FieldNotesRepository } from './field-notes.repository.js';
import { toFieldNoteModel } from './field-notes.mappers.js';
import type { FieldNoteModel } from './models/field-note.model.js';

/** Which revision a view shows: what visitors read, or the working copy. */
export type ViewMode = 'published' | 'latest';

/** Turns note ids into the models a caller may see, in the order given. */
@Injectable()
export class FieldNoteViews {
  constructor(@Inject(FieldNotesRepository) private readonly repo: FieldNotesRepository) {}

  async many(ids: string[], actor: AuthUser | null, mode: ViewMode): Promise<FieldNoteModel[]> {
    const articles = await this.repo.withAuthors(ids);
    const byId = new Map(articles.map((a) => [a.id, a]));
    const pick = (a: ArticleEntity) => (mode === 'published' ? a.publishedRevisionId : a.latestRevisionId);
    const [revisions, positions, reads] = await Promise.all([
      this.repo.revisionsByIds(articles.map(pick)),
      this.repo.positions(ids),
      this.repo.readAts(actor?.id ?? null, ids),
    ]);
    return ids.flatMap((id) => {
      const article = byId.get(id);
      const revisionId = article ? pick(article) : null;
      const revision = revisionId ? revisions.get(revisionId) : undefined;
      if (!article || !revision) return [];
      return [toFieldNoteModel(article, revision, actor, { firstCutsPosition: positions.get(id) ?? null, readAt: reads.get(id) ?? null })];
    });
  }

  async one(id: string, actor: AuthUser | null, mode: ViewMode): Promise<FieldNoteModel> {
    const [model] = await this.many([id], actor, mode);
    if (!model) throw DomainError.notFound('That note');
    return model;
  }

  /** The working copy, for its author and for reviewers; a visitor learns nothing about drafts. */
  async editable(id: string, actor: AuthUser | null): Promise<ArticleEntity> {
    const article = await this.repo.articles.findOneBy({ id });
    if (!article || !mayReadDrafts(actor, article)) throw DomainError.notFound('That note');
    return article;
  }
}

export function mayReadDrafts(actor: AuthUser | null, article: ArticleEntity): boolean {
  return canReviewArticles(actor) || canEditArticle(actor, article) || (actor !== null && actor.id === article.authorId);
}
