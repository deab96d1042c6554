import type { KnowledgeDocument } from '@endgrain/shared';

/** A search hit as the client asks for it (see knowledgeSearchRequest's attributesToRetrieve). */
export type KnowledgeHit = Pick<KnowledgeDocument, 'id' | 'kind' | 'slug' | 'title' | 'summary' | 'url' | 'species' | 'grind' | 'event' | 'condition' | 'evidence' | 'authorName' | 'publishedAt'> & {
  _formatted?: Partial<Record<'title' | 'summary' | 'text', string>>;
};
