import type { ArticleKind } from './article-rules.js';
import type { ArticleTags } from './article-tags.js';
import { conditionById, eventName, grindById, speciesWords } from './tag-vocabulary.js';

// Words that carry no meaning in a question ("which grind for wet poplar?"). The hosted service
// also gets them as its stop-word setting; the client drops them itself so every backend agrees.
export const QUESTION_STOP_WORDS: readonly string[] = [
  'a', 'an', 'and', 'are', 'best', 'can', 'do', 'does', 'for', 'how', 'i', 'in', 'is', 'it', 'my', 'of', 'on', 'or',
  'should', 'the', 'to', 'use', 'what', 'whats', 'when', 'which', 'with', 'would',
];
const STOP = new Set(QUESTION_STOP_WORDS);

/**
 * A question turned into search words: stop words and punctuation dropped, order kept.
 * A trailing space is kept, since it tells the search the last word is finished.
 */
export function questionWords(question: string): string {
  const words = question.split(/[^\p{L}\p{N}'-]+/u).filter(Boolean);
  const kept = words.filter((w) => !STOP.has(w.toLowerCase().replace(/'/g, '')));
  const text = (kept.length > 0 ? kept : words).join(' ');
  return text && /\s$/u.test(question) ? `${text} ` : text;
}

const KIND_WORDS: Record<ArticleKind, readonly string[]> = {
  FINDING: ['finding', 'evidence'],
  GUIDE: ['guide'],
  SAFETY_NOTE: ['safety', 'caution'],
};

/** The words a note's tags stand for, so "wet poplar" finds a note tagged green quaking aspen. */
export function articleKeywords(kind: ArticleKind, tags: ArticleTags): string[] {
  const words = [
    ...KIND_WORDS[kind],
    ...tags.species.flatMap(speciesWords),
    ...tags.conditions.flatMap((c) => conditionById(c)?.words ?? []),
    ...tags.grinds.flatMap((g) => [...(grindById(g)?.words ?? []), 'grind']),
    ...tags.events.flatMap((e) => (eventName(e) ?? '').toLowerCase().split(/[^a-z]+/).filter(Boolean)),
    ...tags.free,
  ];
  return [...new Set(words)];
}
