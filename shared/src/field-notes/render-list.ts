export const LIST_ITEM = /^( *)([-*+]|\d{1,9}[.)]) +(.*)$/;

type RenderBlocks = (lines: readonly string[], options: { tight: boolean }) => string;

function indentOf(line: string): number {
  return line.length - line.trimStart().length;
}

function isOrdered(marker: string): boolean {
  return /\d/.test(marker);
}

/**
 * A bullet or numbered list starting at `start`. Each item's lines (marker removed, continuation
 * de-indented) are rendered as blocks again, so lists nest; items without blank lines stay tight.
 */
export function renderList(
  lines: readonly string[],
  start: number,
  startsBlock: (line: string) => boolean,
  renderBlocks: RenderBlocks,
): { html: string; next: number } {
  const first = LIST_ITEM.exec(lines[start] as string) as RegExpExecArray;
  const indent = (first[1] as string).length;
  const ordered = isOrdered(first[2] as string);
  const items: string[][] = [];
  let loose = false;
  let i = start;
  while (i < lines.length) {
    const line = lines[i] as string;
    const item = LIST_ITEM.exec(line);
    const current = items[items.length - 1];
    if (item && (item[1] as string).length === indent && isOrdered(item[2] as string) === ordered) {
      items.push([item[3] as string]);
    } else if (item && (item[1] as string).length < indent) {
      break;
    } else if (line.trim() === '') {
      const next = lines[i + 1];
      const nextItem = next === undefined ? null : LIST_ITEM.exec(next);
      const continues = next !== undefined && (indentOf(next) > indent || (nextItem !== null && (nextItem[1] as string).length === indent && isOrdered(nextItem[2] as string) === ordered));
      if (!continues) break;
      loose = true;
      current?.push('');
    } else if (indentOf(line) > indent) {
      current?.push(line.slice(Math.min(indentOf(line), indent + 2)));
    } else if (!startsBlock(line)) {
      current?.push(line.trim());
    } else {
      break;
    }
    i += 1;
  }
  const tag = ordered ? 'ol' : 'ul';
  const number = ordered ? Number.parseInt(first[2] as string, 10) : 1;
  const open = ordered && number !== 1 ? `<ol start="${number}">` : `<${tag}>`;
  const body = items.map((itemLines) => `<li>${renderBlocks(itemLines, { tight: !loose })}</li>`).join('');
  return { html: `${open}${body}</${tag}>`, next: i };
}
