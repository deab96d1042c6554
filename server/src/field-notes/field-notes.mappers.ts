import { canEditArticle, canReviewArticles, canSubmitArticle, evidenceHref, publishRefusal, type ArticleActor, type EvidenceLink } from '@endgrain/shared';

import type { ArticleReviewEntity } from './entities/article-review.entity.js';
import type { ArticleRevisionEntity } from './entities/article-revision.entity.js';
import type { ArticleEntity } from './entities/article.entity.js';
import type { FieldNoteReviewModel, FieldNoteRevisionModel } from './models/field-note-history.model.js';
import type { EvidenceLinkModel, FieldNoteModel } from './models/field-note.model.js';
import { ArticleKindEnum, ArticleStatusEnum, EvidenceKindEnum, ReviewActionEnum } from './models/field-notes.enums.js';

export interface NoteExtras {
  firstCutsPosition: number | null;
  readAt: Date | null;
}

export function toEvidenceModel(link: EvidenceLink): EvidenceLinkModel {
  return { ...link, kind: EvidenceKindEnum[link.kind], href: evidenceHref(link) };
}

/** The note as the actor sees it, showing `revision` (the published one, or the working copy). */
export function toFieldNoteModel(article: ArticleEntity, revision: ArticleRevisionEntity, actor: ArticleActor | null, extras: NoteExtras): FieldNoteModel {
  const facts = { kind: article.kind, status: article.status, authorId: article.authorId };
  const refusal = article.status === 'IN_REVIEW' ? publishRefusal(actor, facts) : null;
  return {
    id: article.id,
    slug: article.slug,
    kind: ArticleKindEnum[article.kind],
    status: ArticleStatusEnum[article.status],
    authorId: article.authorId,
    authorName: article.author?.displayName ?? '',
    revisionId: revision.id,
    revisionNumber: revision.number,
    isDraftView: revision.id !== article.publishedRevisionId,
    isPublished: article.publishedRevisionId !== null,
    hasUnpublishedChanges: article.publishedRevisionId !== null && article.latestRevisionId !== article.publishedRevisionId,
    title: revision.title,
    summary: revision.summary,
    bodyMarkdown: revision.bodyMarkdown,
    bodyHtml: revision.bodyHtml,
    tags: revision.tags,
    evidence: revision.evidence.map(toEvidenceModel),
    publishedAt: article.publishedAt,
    updatedAt: article.updatedAt,
    firstCutsPosition: extras.firstCutsPosition,
    readAt: extras.readAt,
    canEdit: canEditArticle(actor, facts),
    canSubmit: canSubmitArticle(actor, facts),
    canReview: canReviewArticles(actor),
    canPublish: article.status === 'IN_REVIEW' && refusal === null,
    publishRefusal: refusal,
  };
}

export function toRevisionModel(revision: ArticleRevisionEntity, publishedRevisionId: string | null): FieldNoteRevisionModel {
  return {
    id: revision.id,
    number: revision.number,
    title: revision.title,
    summary: revision.summary,
    bodyMarkdown: revision.bodyMarkdown,
    tags: revision.tags,
    evidence: revision.evidence.map(toEvidenceModel),
    writtenByName: revision.writer?.displayName ?? '',
    note: revision.note,
    isPublished: revision.id === publishedRevisionId,
    createdAt: revision.createdAt,
  };
}

export function toReviewModel(review: ArticleReviewEntity, numbers: Map<string, number>): FieldNoteReviewModel {
  return {
    id: review.id,
    action: ReviewActionEnum[review.action],
    comment: review.comment,
    actorName: review.actor?.displayName ?? '',
    revisionNumber: numbers.get(review.revisionId) ?? 0,
    createdAt: review.createdAt,
  };
}
