import { escapeHtml, unescapeHtml } from './escape-html.js';
import { safeImageSrc, safeLinkHref } from './safe-url.js';

// NUL is stripped from every source before rendering, so a user can never forge a hole.
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const HOLE = /\u0000(\d+)\u0000/g;

/** Finished HTML set aside while the rest of a line is still being parsed. */
class Holes {
  private readonly parts: string[] = [];

  put(html: string): string {
    this.parts.push(html);
    return `\u0000${this.parts.length - 1}\u0000`;
  }

  fill(text: string): string {
    let out = text;
    // Holes can hold holes (a code span inside a link label); a few rounds fill every level.
    for (let round = 0; round < 8 && out.includes('\u0000'); round += 1) {
      out = out.replace(HOLE, (_, i: string) => this.parts[Number(i)] ?? '');
    }
    return out;
  }
}

function emphasis(text: string): string {
  return text
    .replace(/\*\*(?=\S)(.+?)(?<=\S)\*\*/g, '<strong>$1</strong>')
    .replace(/__(?=\S)(.+?)(?<=\S)__/g, '<strong>$1</strong>')
    .replace(/\*(?=\S)(.+?)(?<=\S)\*/g, '<em>$1</em>')
    .replace(/(^|[^\p{L}\p{N}_])_(?=\S)(.+?)(?<=\S)_(?![\p{L}\p{N}_])/gu, '$1<em>$2</em>')
    .replace(/~~(?=\S)(.+?)(?<=\S)~~/g, '<del>$1</del>');
}

/**
 * Inline markdown over text that is ALREADY HTML-escaped: code, images, links, emphasis.
 * Only our own tags are added; URLs are read back from the escaped text, checked, and escaped again.
 */
export function renderInline(escaped: string): string {
  const holes = new Holes();
  let text = escaped
    .replace(/\\([\\`*_{}[\]()#+\-.!|~])/g, (_, c: string) => holes.put(c))
    .replace(/`([^`\n]+)`/g, (_, code: string) => holes.put(`<code>${code.trim()}</code>`));
  text = text.replace(/!\[([^\]\n]*)\]\(([^()\s]+)\)/g, (_, alt: string, url: string) => {
    const src = safeImageSrc(unescapeHtml(url));
    return holes.put(src === null ? alt : `<img src="${escapeHtml(src)}" alt="${alt.replace(HOLE, '')}" loading="lazy">`);
  });
  text = text.replace(/\[([^\]\n]+)\]\(([^()\s]+)\)/g, (_, label: string, url: string) => {
    const href = safeLinkHref(unescapeHtml(url));
    const inner = emphasis(label);
    return holes.put(href === null ? inner : `<a href="${escapeHtml(href)}" rel="nofollow noopener noreferrer">${inner}</a>`);
  });
  return holes.fill(emphasis(text));
}
