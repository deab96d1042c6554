// Letters and digits make words; everything else separates them.
const WORD = /[\p{L}\p{N}]+/gu;
const COMBINING_MARKS = /\p{M}+/gu;
// eslint-disable-next-line no-control-regex -- the whole 7-bit range is meant
const ASCII = /^[\x00-\x7f]*$/;

export interface WordSpan {
  start: number;
  end: number;
  term: string;
}

/** Lower case without accents, so "Épinette" and "epinette" are one term. */
export function normalizeTerm(word: string): string {
  // Plain ASCII has no accents to strip; skipping NFD keeps filters over many documents fast.
  if (ASCII.test(word)) return word.toLowerCase();
  return word.normalize('NFD').replace(COMBINING_MARKS, '').toLowerCase();
}

/** The words of a text, as written. Used for both indexing and queries so they agree. */
export function tokenize(text: string): string[] {
  return text.match(WORD) ?? [];
}

/** Each word's place in the text and its normalised term, for highlighting and cropping. */
export function wordSpans(text: string): WordSpan[] {
  const spans: WordSpan[] = [];
  for (const match of text.matchAll(WORD)) {
    const start = match.index;
    spans.push({ start, end: start + match[0].length, term: normalizeTerm(match[0]) });
  }
  return spans;
}

/** The distinct normalised terms of a query, in order. */
export function queryTerms(query: string): string[] {
  return [...new Set(tokenize(query).map(normalizeTerm))];
}
