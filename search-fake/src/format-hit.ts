import type { Doc } from './document-path.js';
import { wordSpans, type WordSpan } from './tokenize.js';

/** For a word of the text: how many of its letters to wrap in tags, or 0 when it did not match. */
export type WordMatcher = (term: string) => number;

export interface FormatOptions {
  highlight: readonly string[] | null;
  crop: readonly string[] | null;
  cropLength: number;
  cropMarker: string;
  preTag: string;
  postTag: string;
  matcher: WordMatcher;
}

/**
 * Exact and typo matches are wrapped whole; a prefix match only over the letters typed,
 * as a search-as-you-type box shows them.
 */
export function wordMatcher(queryWords: readonly string[], matchedTerms: readonly string[], prefixWord: string | null): WordMatcher {
  const exact = new Set(queryWords);
  const matched = new Set(matchedTerms);
  return (term) => {
    if (exact.has(term)) return term.length;
    if (!matched.has(term)) return 0;
    return prefixWord !== null && term.startsWith(prefixWord) ? prefixWord.length : term.length;
  };
}

/** `attr` or `attr:N` entries, `*` for all: the crop length for one attribute, or null. */
function cropFor(attribute: string, options: FormatOptions): number | null {
  if (options.crop === null) return null;
  for (const entry of options.crop) {
    const [name, length] = entry.split(':');
    if (name === '*' || name === attribute || name?.split('.')[0] === attribute) {
      return length !== undefined && /^\d+$/.test(length) ? Number(length) : options.cropLength;
    }
  }
  return null;
}

function highlightsAttribute(attribute: string, options: FormatOptions): boolean {
  return options.highlight !== null
    && options.highlight.some((name) => name === '*' || name === attribute || name.split('.')[0] === attribute);
}

function cropWindow(spans: WordSpan[], cropLength: number, matcher: WordMatcher): [number, number] {
  const first = spans.findIndex((span) => matcher(span.term) > 0);
  let start = first < 0 ? 0 : Math.max(0, first - Math.floor((cropLength - 1) / 2));
  const end = Math.min(spans.length, start + cropLength);
  start = Math.max(0, end - cropLength);
  return [start, end];
}

function formatText(text: string, highlight: boolean, cropLength: number | null, options: FormatOptions): string {
  const spans = wordSpans(text);
  let [from, to] = [0, spans.length];
  if (cropLength !== null && spans.length > 0) [from, to] = cropWindow(spans, cropLength, options.matcher);
  if (to <= from) return cropLength !== null && spans.length > 0 ? options.cropMarker : text;
  let cursor = cropLength === null || from === 0 ? 0 : (spans[from] as WordSpan).start;
  let out = cropLength !== null && from > 0 ? options.cropMarker : '';
  for (const span of spans.slice(from, to)) {
    const letters = highlight ? options.matcher(span.term) : 0;
    if (letters === 0) continue;
    // Accents stripped in the term can change its length: then the whole word is wrapped.
    const wrapEnd = span.term.length === span.end - span.start ? span.start + letters : span.end;
    out += text.slice(cursor, span.start) + options.preTag + text.slice(span.start, wrapEnd) + options.postTag;
    cursor = wrapEnd;
  }
  const stop = cropLength === null || to === spans.length ? text.length : (spans[to - 1] as WordSpan).end;
  out += text.slice(cursor, stop);
  if (cropLength !== null && to < spans.length) out += options.cropMarker;
  return out;
}

function formatValue(value: unknown, highlight: boolean, cropLength: number | null, options: FormatOptions): unknown {
  if (typeof value === 'string') return highlight || cropLength !== null ? formatText(value, highlight, cropLength, options) : value;
  if (typeof value === 'number') return String(value);
  if (Array.isArray(value)) return value.map((item) => formatValue(item, highlight, cropLength, options));
  if (typeof value === 'object' && value !== null) {
    return Object.fromEntries(Object.entries(value).map(([key, item]) => [key, formatValue(item, highlight, cropLength, options)]));
  }
  return value;
}

/** The `_formatted` copy of a hit: every retrieved attribute, matches wrapped, long texts cropped. */
export function formatHit(doc: Doc, options: FormatOptions): Doc {
  const out: Doc = {};
  for (const [attribute, value] of Object.entries(doc)) {
    out[attribute] = formatValue(value, highlightsAttribute(attribute, options), cropFor(attribute, options), options);
  }
  return out;
}
