import { renderInline } from './render-inline.js';

const DELIMITER_CELL = /^:?-{3,}:?$/;

function cells(line: string): string[] {
  let row = line.trim();
  if (row.startsWith('|')) row = row.slice(1);
  if (row.endsWith('|') && !row.endsWith('\\|')) row = row.slice(0, -1);
  return row.split(/(?<!\\)\|/).map((cell) => cell.trim());
}

/** A header row followed by a `| --- | :-: |` delimiter row starts a table. */
export function isTableStart(lines: readonly string[], i: number): boolean {
  const head = lines[i];
  const delimiter = lines[i + 1];
  if (head === undefined || delimiter === undefined || !head.includes('|') || !delimiter.includes('-')) return false;
  const parts = cells(delimiter);
  return parts.length === cells(head).length && parts.every((cell) => DELIMITER_CELL.test(cell));
}

function alignClass(delimiter: string): string {
  const left = delimiter.startsWith(':');
  const right = delimiter.endsWith(':');
  if (left && right) return ' class="align-center"';
  if (right) return ' class="align-right"';
  return left ? ' class="align-left"' : '';
}

/** Renders the table that starts at `start`; rows run until a blank line or a line without a pipe. */
export function renderTable(lines: readonly string[], start: number): { html: string; next: number } {
  const header = cells(lines[start] as string);
  const aligns = cells(lines[start + 1] as string).map(alignClass);
  const row = (values: string[], tag: 'th' | 'td') =>
    `<tr>${header.map((_, c) => `<${tag}${aligns[c] ?? ''}>${renderInline(values[c] ?? '')}</${tag}>`).join('')}</tr>`;
  const body: string[] = [];
  let i = start + 2;
  while (i < lines.length && (lines[i] as string).trim() !== '' && (lines[i] as string).includes('|')) {
    body.push(row(cells(lines[i] as string), 'td'));
    i += 1;
  }
  const tbody = body.length ? `<tbody>${body.join('')}</tbody>` : '';
  return { html: `<table><thead>${row(header, 'th')}</thead>${tbody}</table>`, next: i };
}
