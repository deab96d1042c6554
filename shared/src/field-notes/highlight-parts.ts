import { HIGHLIGHT_POST, HIGHLIGHT_PRE } from './search-settings.js';

export interface HighlightPart {
  text: string;
  marked: boolean;
}

/**
 * Splits a highlighted search value into plain and marked pieces, so the client renders them as
 * text nodes (never as HTML: the service copies document text into highlights as it is).
 */
export function highlightParts(value: string, pre = HIGHLIGHT_PRE, post = HIGHLIGHT_POST): HighlightPart[] {
  const parts: HighlightPart[] = [];
  let rest = value;
  while (rest.length > 0) {
    const open = rest.indexOf(pre);
    if (open === -1) {
      parts.push({ text: rest, marked: false });
      break;
    }
    if (open > 0) parts.push({ text: rest.slice(0, open), marked: false });
    const close = rest.indexOf(post, open + pre.length);
    const end = close === -1 ? rest.length : close;
    const marked = rest.slice(open + pre.length, end);
    if (marked) parts.push({ text: marked, marked: true });
    rest = close === -1 ? '' : rest.slice(close + post.length);
  }
  return parts;
}
