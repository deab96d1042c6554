import type { ArticleKind, ArticleTags, EvidenceLink } from '@endgrain/shared';

/** One demo note as the seed writes it: who wrote it, its text, and when it went live. */
export interface SeedNote {
  slug: string;
  kind: ArticleKind;
  authorEmail: string;
  title: string;
  summary: string;
  body: string;
  tags: Partial<ArticleTags>;
  evidence?: Omit<EvidenceLink, 'refId'>[];
  /** ISO date it was published in the demo season. */
  publishedOn: string;
}

/** The closing lines every demo guide carries. */
export const COACHING_CAUTION = `> Endgrain is no substitute for coaching. Follow your sanctioning body's rules, your host's rules and local law, and learn every skill here from a qualified coach, in person.`;
