import type { KnowledgeDocument } from '@endgrain/shared';

import type { SearchSource } from '../search/search-source.js';
import type { FieldNotesRepository } from './field-notes.repository.js';
import { ARTICLE_DOCUMENT_PREFIX, toKnowledgeDocument } from './knowledge-document.js';

export const ARTICLE_SEARCH_TYPE = 'article';

/** Published notes, read fresh from the database whenever the outbox sends them. */
export class ArticleSearchSource implements SearchSource {
  readonly type = ARTICLE_SEARCH_TYPE;

  constructor(private readonly repo: FieldNotesRepository) {}

  async documents(ids: string[]): Promise<{ documents: KnowledgeDocument[]; gone: string[] }> {
    const articles = await this.repo.withAuthors(ids);
    const revisions = await this.repo.revisionsByIds(articles.map((a) => a.publishedRevisionId));
    const documents: KnowledgeDocument[] = [];
    for (const article of articles) {
      const revision = article.publishedRevisionId ? revisions.get(article.publishedRevisionId) : undefined;
      if (revision) documents.push(toKnowledgeDocument(article, revision));
    }
    const live = new Set(documents.map((d) => d.id));
    const gone = ids.map((id) => `${ARTICLE_DOCUMENT_PREFIX}${id}`).filter((docId) => !live.has(docId));
    return { documents, gone };
  }

  allIds(): Promise<string[]> {
    return this.repo.allPublishedIds();
  }
}
