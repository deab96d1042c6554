import { articleKeywords, conditionById, eventName, grindById, speciesName, unescapeHtml, type KnowledgeDocument } from '@endgrain/shared';

import type { ArticleRevisionEntity } from './entities/article-revision.entity.js';
import type { ArticleEntity } from './entities/article.entity.js';

export const ARTICLE_DOCUMENT_PREFIX = 'article-';

/** The words of rendered HTML, tags dropped and our five entities read back. */
export function plainText(html: string): string {
  return unescapeHtml(html.replace(/<[^>]*>/g, ' ')).replace(/\s+/g, ' ').trim();
}

/** A published note as the search index holds it: text, tag words for plain questions, facets, evidence. */
export function toKnowledgeDocument(article: ArticleEntity, revision: ArticleRevisionEntity): KnowledgeDocument {
  const { tags } = revision;
  const keywords = articleKeywords(article.kind, tags);
  return {
    id: `${ARTICLE_DOCUMENT_PREFIX}${article.id}`,
    type: 'article',
    kind: article.kind,
    slug: article.slug,
    title: revision.title,
    summary: revision.summary,
    text: plainText(revision.bodyHtml),
    keywords,
    findingKeywords: article.kind === 'FINDING' ? keywords : [],
    tags: [
      ...tags.species.map((s) => speciesName(s) ?? s),
      ...tags.grinds.map((g) => grindById(g)?.label ?? g),
      ...tags.events.map((e) => eventName(e) ?? e),
      ...tags.conditions.map((c) => conditionById(c)?.label ?? c),
      ...tags.free,
    ],
    evidence: revision.evidence.map((e) => (e.summary ? `${e.label}: ${e.summary}` : e.label)),
    species: tags.species,
    grind: tags.grinds,
    event: tags.events,
    condition: tags.conditions,
    authorName: article.author?.displayName ?? '',
    publishedAt: article.publishedAt?.getTime() ?? 0,
    url: `/field-notes/${article.slug}`,
  };
}
