import { escapeHtml } from './escape-html.js';
import { renderInline } from './render-inline.js';
import { LIST_ITEM, renderList } from './render-list.js';
import { isTableStart, renderTable } from './render-table.js';

const FENCE = /^ {0,3}(```|~~~)\s*([A-Za-z0-9_-]*)\s*$/;
const HEADING = /^ {0,3}(#{1,6}) +(.+?)(?: +#+)? *$/;
const RULE = /^ {0,3}([-*_])(?: *\1){2,} *$/;
// Blockquote markers are matched after escaping, so ">" arrives as "&gt;".
const QUOTE = /^ {0,3}&gt; ?/;
// Everything but tab and newline below U+0020 (NUL included, which the inline parser relies on).
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const CONTROLS = /[\u0000-\u0008\u000b-\u001f\u007f]/g;

function startsBlock(line: string): boolean {
  return FENCE.test(line) || HEADING.test(line) || RULE.test(line) || QUOTE.test(line) || LIST_ITEM.test(line);
}

function renderBlocks(lines: readonly string[], options: { tight: boolean }): string {
  const out: string[] = [];
  let i = 0;
  while (i < lines.length) {
    const line = lines[i] as string;
    const fence = FENCE.exec(line);
    const heading = HEADING.exec(line);
    if (line.trim() === '') {
      i += 1;
    } else if (fence) {
      const code: string[] = [];
      i += 1;
      while (i < lines.length && !(lines[i] as string).trimStart().startsWith(fence[1] as string)) code.push(lines[i++] as string);
      i += 1;
      const language = fence[2] ? ` class="language-${fence[2]}"` : '';
      out.push(`<pre><code${language}>${code.join('\n')}</code></pre>`);
    } else if (heading) {
      // The article title is the page's h1, so "#" in the body is a second-level heading.
      const level = Math.min(6, (heading[1] as string).length + 1);
      out.push(`<h${level}>${renderInline(heading[2] as string)}</h${level}>`);
      i += 1;
    } else if (RULE.test(line)) {
      out.push('<hr>');
      i += 1;
    } else if (QUOTE.test(line)) {
      const quoted: string[] = [];
      while (i < lines.length && QUOTE.test(lines[i] as string)) quoted.push((lines[i++] as string).replace(QUOTE, ''));
      out.push(`<blockquote>${renderBlocks(quoted, { tight: false })}</blockquote>`);
    } else if (LIST_ITEM.test(line)) {
      const list = renderList(lines, i, startsBlock, renderBlocks);
      out.push(list.html);
      i = list.next;
    } else if (isTableStart(lines, i)) {
      const table = renderTable(lines, i);
      out.push(table.html);
      i = table.next;
    } else {
      const paragraph: string[] = [];
      while (i < lines.length && (lines[i] as string).trim() !== '' && !startsBlock(lines[i] as string) && !isTableStart(lines, i)) {
        paragraph.push((lines[i++] as string).trim());
      }
      const html = renderInline(paragraph.join('\n'));
      out.push(options.tight ? html : `<p>${html}</p>`);
    }
  }
  return out.join('\n');
}

/**
 * Strict markdown to HTML. ALL of the source is HTML-escaped first, then only our own tags are
 * added (headings, paragraphs, emphasis, lists, tables, code, quotes, rules, links with http(s),
 * mailto or relative targets, images from our own /api routes). Raw HTML, event handlers and
 * script URLs therefore come out as visible text, whatever the author writes.
 */
export function renderMarkdown(source: string): string {
  const text = source.replace(/\r\n?/g, '\n').replace(/\t/g, '    ').replace(CONTROLS, '');
  return renderBlocks(escapeHtml(text).split('\n'), { tight: false });
}
