import MiniSearch from 'minisearch';

import { valuesAt, type Doc } from './document-path.js';
import type { TypoToleranceSettings } from './index-settings.js';
import { normalizeTerm, queryTerms, tokenize } from './tokenize.js';

export type MatchingStrategy = 'last' | 'all' | 'frequency';

export interface TextMatch {
  id: string;
  score: number;
  /** How many query words the document answers, by the matching strategy's rule (the "words" rank). */
  wordsMatched: number;
  /** The document's own terms that matched, for highlighting. */
  terms: string[];
}

export interface TextQuery {
  query: string;
  fields?: readonly string[];
  strategy: MatchingStrategy;
  typo: TypoToleranceSettings;
  /** The filter, pushed down: documents it rejects are never scored. */
  accept?: (id: string) => boolean;
}

// A key no document field can collide with: MiniSearch needs an id field name.
const ID_FIELD = '\u0000id';

/** The full-text side of one index, kept up to date document by document. */
export class TextIndex {
  private fields: string[] = [];
  private mini: MiniSearch<Doc>;

  constructor(private readonly idOf: (doc: Doc) => string) {
    this.mini = this.create([]);
  }

  get searchableFields(): readonly string[] {
    return this.fields;
  }

  /** Rebuilds only when the searchable fields change; otherwise documents are added one by one. */
  useFields(fields: readonly string[], docs: Iterable<Doc>): void {
    if (fields.length === this.fields.length && fields.every((field, i) => field === this.fields[i])) return;
    this.fields = [...fields];
    this.mini = this.create(this.fields);
    this.mini.addAll([...docs]);
  }

  add(doc: Doc): void {
    this.mini.add(doc);
  }

  /** Takes a document out; it must be the very version that was added. */
  remove(doc: Doc): void {
    this.mini.remove(doc);
  }

  clear(): void {
    this.mini.removeAll();
  }

  search({ query, fields, strategy, typo, accept }: TextQuery): TextMatch[] {
    const terms = queryTerms(query);
    if (terms.length === 0 || this.fields.length === 0) return [];
    // Like the service: only the last word is a prefix, and not once the user typed a space after it.
    const prefixLast = !/\s$/u.test(query);
    const boost: Record<string, number> = {};
    this.fields.forEach((field, i) => (boost[field] = this.fields.length - i));
    const results = this.mini.search(query, {
      fields: fields === undefined ? this.fields : this.fields.filter((field) => fields.includes(field)),
      boost,
      combineWith: 'OR',
      prefix: (_term, i, all) => prefixLast && i === all.length - 1,
      fuzzy: (term) => typoBudget(term, typo),
      // A zero boost makes MiniSearch skip the document before scoring it; answers are memoised
      // because a document is offered once per matching term and field.
      boostDocument: accept === undefined ? undefined : memoise(accept),
    });
    const matches: TextMatch[] = [];
    for (const result of results) {
      const matched = new Set<string>(result.queryTerms);
      const wordsMatched = countWords(terms, matched, strategy);
      if (wordsMatched === 0) continue;
      matches.push({ id: String(result.id), score: result.score, wordsMatched, terms: result.terms });
    }
    return matches;
  }

  private create(fields: string[]): MiniSearch<Doc> {
    return new MiniSearch<Doc>({
      fields,
      storeFields: [],
      idField: ID_FIELD,
      extractField: (doc, field) => (field === ID_FIELD ? this.idOf(doc) : textOf(doc, field)),
      tokenize,
      processTerm: normalizeTerm,
    });
  }
}

function memoise(accept: (id: string) => boolean): (id: unknown) => number {
  const seen = new Map<unknown, number>();
  return (id) => {
    let boost = seen.get(id);
    if (boost === undefined) {
      boost = accept(String(id)) ? 1 : 0;
      seen.set(id, boost);
    }
    return boost;
  };
}

function textOf(doc: Doc, field: string): string {
  return valuesAt(doc, field)
    .filter((value) => typeof value === 'string' || typeof value === 'number')
    .join(' ');
}

/** Typos allowed for one query word: none for short words, one from 5 letters, two from 9 by default. */
function typoBudget(term: string, typo: TypoToleranceSettings): number {
  if (!typo.enabled || typo.disableOnWords.includes(term)) return 0;
  if (typo.disableOnNumbers && /^\d+$/u.test(term)) return 0;
  if (term.length >= typo.minWordSizeForTypos.twoTypos) return 2;
  return term.length >= typo.minWordSizeForTypos.oneTypo ? 1 : 0;
}

function countWords(terms: string[], matched: Set<string>, strategy: MatchingStrategy): number {
  if (strategy === 'frequency') return terms.filter((term) => matched.has(term)).length;
  // "last": words are dropped from the end of the query, so count the leading run matched.
  let run = 0;
  while (run < terms.length && matched.has(terms[run] as string)) run += 1;
  if (strategy === 'all') return run === terms.length ? run : 0;
  return run;
}
