import { describe, expect, it } from '@jest/globals';
import fc from 'fast-check';

import { diffLines, type DiffLine } from './diff-lines.js';

const compact = (lines: DiffLine[]) => lines.map((l) => `${l.kind === 'same' ? ' ' : l.kind === 'added' ? '+' : '-'}${l.text}`);

describe('diffLines', () => {
  it('marks a changed line as removed then added, keeping the lines around it', () => {
    // hand-worked: only the middle line differs, so it is the one removed and re-added.
    expect(compact(diffLines('boots\nglasses\nchaps', 'boots\nsafety glasses\nchaps'))).toEqual([' boots', '-glasses', '+safety glasses', ' chaps']);
  });

  it('numbers lines on both sides', () => {
    const lines = diffLines('a\nb', 'a\nx\nb');
    // hand-worked: "x" is new line 2; "b" moves from old line 2 to new line 3.
    expect(lines).toEqual([
      { kind: 'same', text: 'a', before: 1, after: 1 },
      { kind: 'added', text: 'x', before: null, after: 2 },
      { kind: 'same', text: 'b', before: 2, after: 3 },
    ]);
  });

  it('finds the longest run of shared lines, not just the first match', () => {
    // hand-worked: LCS of [a b c d] and [b c d a] is [b c d] (3 lines), so only "a" moves.
    expect(compact(diffLines('a\nb\nc\nd', 'b\nc\nd\na'))).toEqual(['-a', ' b', ' c', ' d', '+a']);
  });

  it('treats an empty text as no lines', () => {
    expect(compact(diffLines('', 'one'))).toEqual(['+one']);
    expect(diffLines('', '')).toEqual([]);
  });

  it('rebuilds both texts from the comparison, for any texts', () => {
    const text = fc.array(fc.constantFrom('a', 'b', 'c', ''), { maxLength: 12 }).map((l) => l.join('\n'));
    fc.assert(
      fc.property(text, text, (older, newer) => {
        const lines = diffLines(older, newer);
        expect(lines.filter((l) => l.kind !== 'added').map((l) => l.text).join('\n')).toBe(older === '' ? '' : older);
        expect(lines.filter((l) => l.kind !== 'removed').map((l) => l.text).join('\n')).toBe(newer);
      }),
      { numRuns: 300, seed: 7 },
    );
  });
});
