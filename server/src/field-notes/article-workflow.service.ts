import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { canReviewArticles, canSubmitArticle, publishRefusal, SEND_BACK_COMMENT_MIN, type ArticleStatus } from '@endgrain/shared';
import type { EntityManager } from 'typeorm';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { SearchIndexer } from '../search/search-indexer.service.js';
import { SearchOutboxRepository } from '../search/search-outbox.repository.js';
import { ArticleReviewEntity, type ReviewActionValue } from './entities/article-review.entity.js';
import { ArticleRevisionEntity } from './entities/article-revision.entity.js';
import { ArticleEntity } from './entities/article.entity.js';
import { ARTICLE_SEARCH_TYPE } from './article-search-source.js';
import { FieldNoteViews } from './field-note-views.js';
import { FieldNotesRepository } from './field-notes.repository.js';
import type { FieldNoteModel } from './models/field-note.model.js';

/** draft → in review → published, and back: each step leaves a line in the review trail. */
@Injectable()
export class ArticleWorkflowService {
  constructor(
    @Inject(FieldNotesRepository) private readonly repo: FieldNotesRepository,
    @Inject(FieldNoteViews) private readonly views: FieldNoteViews,
    @Inject(SearchOutboxRepository) private readonly outbox: SearchOutboxRepository,
    @Inject(SearchIndexer) private readonly indexer: SearchIndexer,
  ) {}

  async submit(actor: AuthUser, id: string): Promise<FieldNoteModel> {
    const article = await this.views.editable(id, actor);
    if (article.status !== 'DRAFT') throw DomainError.badInput('status', 'Only a draft is sent for review.');
    if (!canSubmitArticle(actor, article)) throw DomainError.forbidden('Only its author or an administrator sends a note for review.');
    const latest = await this.latest(article);
    if (article.kind === 'FINDING' && latest.evidence.length === 0) {
      throw DomainError.badInput('evidence', 'A finding needs at least one piece of evidence (a trial, a result or a Grain Map cell) before review.');
    }
    await this.step(article, actor, 'IN_REVIEW', 'SUBMITTED', '', {});
    return this.views.one(id, actor, 'latest');
  }

  async sendBack(actor: AuthUser, id: string, comment: string): Promise<FieldNoteModel> {
    if (!canReviewArticles(actor)) throw DomainError.forbidden('Only a league administrator reviews Field Notes.');
    const article = await this.inReview(id, actor);
    await this.step(article, actor, 'DRAFT', 'SENT_BACK', requiredComment(comment, 'what needs changing'), {});
    return this.views.one(id, actor, 'latest');
  }

  async publish(actor: AuthUser, id: string, comment: string): Promise<FieldNoteModel> {
    const article = await this.repo.articles.findOneBy({ id });
    if (!article) throw DomainError.notFound('That note');
    const refusal = publishRefusal(actor, article);
    if (refusal) throw article.status !== 'IN_REVIEW' && canReviewArticles(actor) ? DomainError.badInput('status', refusal) : DomainError.forbidden(refusal);
    const changes = { publishedRevisionId: article.latestRevisionId, publishedAt: new Date() };
    await this.step(article, actor, 'PUBLISHED', 'PUBLISHED', (comment ?? '').trim().slice(0, 2000), changes, true);
    return this.views.one(id, actor, 'published');
  }

  /** Takes a note off the public pages (and out of search); its revisions stay. */
  async unpublish(actor: AuthUser, id: string, comment: string): Promise<FieldNoteModel> {
    if (!canReviewArticles(actor)) throw DomainError.forbidden('Only a league administrator withdraws Field Notes.');
    const article = await this.views.editable(id, actor);
    if (!article.publishedRevisionId) throw DomainError.badInput('status', 'The note is not published.');
    await this.step(article, actor, 'DRAFT', 'UNPUBLISHED', requiredComment(comment, 'why it is withdrawn'), { publishedRevisionId: null, publishedAt: null }, true);
    return this.views.one(id, actor, 'latest');
  }

  private async inReview(id: string, actor: AuthUser): Promise<ArticleEntity> {
    const article = await this.views.editable(id, actor);
    if (article.status !== 'IN_REVIEW') throw DomainError.badInput('status', 'The note is not waiting for review.');
    return article;
  }

  private async latest(article: ArticleEntity): Promise<ArticleRevisionEntity> {
    return this.repo.revisions.findOneByOrFail({ id: article.latestRevisionId ?? '' });
  }

  /** One workflow step in one transaction; public changes also queue the search update there. */
  private async step(
    article: ArticleEntity,
    actor: AuthUser,
    status: ArticleStatus,
    action: ReviewActionValue,
    comment: string,
    changes: Partial<Pick<ArticleEntity, 'publishedRevisionId' | 'publishedAt'>>,
    reindex = false,
  ): Promise<void> {
    await this.repo.db.transaction(async (m: EntityManager) => {
      await m.getRepository(ArticleEntity).update({ id: article.id }, { status, ...changes });
      await m.getRepository(ArticleReviewEntity).insert({ id: randomUUID(), articleId: article.id, revisionId: article.latestRevisionId ?? '', actorId: actor.id, action, comment });
      if (reindex) await this.outbox.enqueue(m, ARTICLE_SEARCH_TYPE, [article.id]);
    });
    if (reindex) this.indexer.kick();
  }
}

function requiredComment(comment: string, what: string): string {
  const text = (comment ?? '').trim();
  if (text.length < SEND_BACK_COMMENT_MIN) throw DomainError.badInput('comment', `Say ${what} (at least ${SEND_BACK_COMMENT_MIN} characters).`);
  return text.slice(0, 2000);
}
