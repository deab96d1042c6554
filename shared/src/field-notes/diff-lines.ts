export type DiffLineKind = 'same' | 'added' | 'removed';

export interface DiffLine {
  kind: DiffLineKind;
  text: string;
  /** Line number in the older text (1-based); null for an added line. */
  before: number | null;
  /** Line number in the newer text (1-based); null for a removed line. */
  after: number | null;
}

// Past this many cells the table would be large; such revisions are shown as one replaced block.
const MAX_CELLS = 4_000_000;

function split(text: string): string[] {
  return text === '' ? [] : text.replace(/\r\n?/g, '\n').split('\n');
}

/**
 * A line-by-line comparison of two texts by longest common subsequence, common head and tail
 * trimmed first. Removed lines come before the added lines that replace them.
 */
export function diffLines(older: string, newer: string): DiffLine[] {
  const a = split(older);
  const b = split(newer);
  let head = 0;
  while (head < a.length && head < b.length && a[head] === b[head]) head += 1;
  let tail = 0;
  while (tail < a.length - head && tail < b.length - head && a[a.length - 1 - tail] === b[b.length - 1 - tail]) tail += 1;
  const midA = a.slice(head, a.length - tail);
  const midB = b.slice(head, b.length - tail);
  const out: DiffLine[] = [];
  for (let i = 0; i < head; i += 1) out.push({ kind: 'same', text: a[i] as string, before: i + 1, after: i + 1 });
  out.push(...middle(midA, midB, head));
  for (let k = tail; k > 0; k -= 1) {
    out.push({ kind: 'same', text: a[a.length - k] as string, before: a.length - k + 1, after: b.length - k + 1 });
  }
  return out;
}

function middle(a: string[], b: string[], offset: number): DiffLine[] {
  const removed = (i: number): DiffLine => ({ kind: 'removed', text: a[i] as string, before: offset + i + 1, after: null });
  const added = (j: number): DiffLine => ({ kind: 'added', text: b[j] as string, before: null, after: offset + j + 1 });
  if (a.length * b.length > MAX_CELLS) return [...a.map((_, i) => removed(i)), ...b.map((_, j) => added(j))];
  // lcs[i][j]: longest common subsequence of a[i..] and b[j..].
  const width = b.length + 1;
  const lcs = new Uint32Array((a.length + 1) * width);
  for (let i = a.length - 1; i >= 0; i -= 1) {
    for (let j = b.length - 1; j >= 0; j -= 1) {
      lcs[i * width + j] = a[i] === b[j] ? (lcs[(i + 1) * width + j + 1] as number) + 1 : Math.max(lcs[(i + 1) * width + j] as number, lcs[i * width + j + 1] as number);
    }
  }
  const out: DiffLine[] = [];
  let i = 0;
  let j = 0;
  while (i < a.length || j < b.length) {
    if (i < a.length && j < b.length && a[i] === b[j]) {
      out.push({ kind: 'same', text: a[i] as string, before: offset + i + 1, after: offset + j + 1 });
      i += 1;
      j += 1;
    } else if (j >= b.length || (i < a.length && (lcs[(i + 1) * width + j] as number) >= (lcs[i * width + j + 1] as number))) {
      out.push(removed(i));
      i += 1;
    } else {
      out.push(added(j));
      j += 1;
    }
  }
  return out;
}
