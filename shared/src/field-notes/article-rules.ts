import type { Actor } from '../auth/index.js';

export const ARTICLE_KINDS = ['FINDING', 'GUIDE', 'SAFETY_NOTE'] as const;
export type ArticleKind = (typeof ARTICLE_KINDS)[number];

/** draft → in review → published; sending back returns a review to draft. */
export const ARTICLE_STATUSES = ['DRAFT', 'IN_REVIEW', 'PUBLISHED'] as const;
export type ArticleStatus = (typeof ARTICLE_STATUSES)[number];

/** A reviewer who sends work back says why, in at least this many characters. */
export const SEND_BACK_COMMENT_MIN = 10;

export type ArticleActor = Actor & { id: string };

export interface ArticleFacts {
  kind: ArticleKind;
  status: ArticleStatus;
  authorId: string;
}

/** Coaches write Field Notes; admins write and curate them. Athletes and organisers read. */
export function canWriteArticles(actor: Actor | null | undefined): boolean {
  return actor?.role === 'ADMIN' || actor?.role === 'COACH';
}

/** Admins edit anything; an author edits their own note unless it is waiting for review. */
export function canEditArticle(actor: ArticleActor | null | undefined, article: ArticleFacts): boolean {
  if (!actor) return false;
  if (actor.role === 'ADMIN') return true;
  return actor.role === 'COACH' && actor.id === article.authorId && article.status !== 'IN_REVIEW';
}

export function canSubmitArticle(actor: ArticleActor | null | undefined, article: ArticleFacts): boolean {
  return article.status === 'DRAFT' && canEditArticle(actor, article);
}

export function canReviewArticles(actor: Actor | null | undefined): boolean {
  return actor?.role === 'ADMIN';
}

/**
 * Why the actor may not publish this note, or null when they may. Only admins publish, only
 * what is in review, and a finding (a claim about evidence) always needs someone other than its author.
 */
export function publishRefusal(actor: ArticleActor | null | undefined, article: ArticleFacts): string | null {
  if (!actor || actor.role !== 'ADMIN') return 'Only a league administrator publishes Field Notes.';
  if (article.status !== 'IN_REVIEW') return 'Send the note for review first; only notes in review are published.';
  if (article.kind === 'FINDING' && article.authorId === actor.id) {
    return 'A finding needs a second pair of eyes: another administrator publishes it.';
  }
  return null;
}
