import { QUESTION_STOP_WORDS } from './search-words.js';

/** The index that holds Field Notes (and, later, public Rack axes). */
export const KNOWLEDGE_INDEX_UID = 'endgrain-knowledge';

/** Facets the search page offers, in order; each is a filterable array field of the documents. */
export const SEARCH_FACETS = ['kind', 'species', 'grind', 'event', 'condition'] as const;
export type SearchFacet = (typeof SEARCH_FACETS)[number];

// Earlier attributes weigh more: a title or tag word beats the same word deep in the text. A question
// about wood and grind is best answered by evidence, so a finding's tag words come first of all.
export const KNOWLEDGE_INDEX_SETTINGS = {
  searchableAttributes: ['findingKeywords', 'title', 'keywords', 'summary', 'tags', 'evidence', 'text'],
  filterableAttributes: ['type', ...SEARCH_FACETS],
  sortableAttributes: ['publishedAt'],
  stopWords: [...QUESTION_STOP_WORDS],
};

/** Highlight markers from the Private Use Area: no text a person writes contains them. */
export const HIGHLIGHT_PRE = '\uE000';
export const HIGHLIGHT_POST = '\uE001';

/** One search document: what the index holds for a published note. */
export interface KnowledgeDocument {
  id: string;
  type: 'article' | 'axe';
  kind: string;
  slug: string;
  title: string;
  summary: string;
  text: string;
  keywords: string[];
  /** The same words for a finding, empty for guides and safety notes (see the searchable order). */
  findingKeywords: string[];
  tags: string[];
  evidence: string[];
  species: string[];
  grind: string[];
  event: string[];
  condition: string[];
  authorName: string;
  /** Milliseconds since 1970, for sorting. */
  publishedAt: number;
  url: string;
}
