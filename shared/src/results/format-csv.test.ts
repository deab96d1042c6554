import { describe, expect, it } from '@jest/globals';

import { formatCsv } from './format-csv.js';
import { parseCsv } from './parse-csv.js';

describe('formatCsv', () => {
  it('quotes cells with commas, quotes and line breaks and ends lines in CRLF', () => {
    // RFC 4180 §2 rules 1, 6 and 7, hand-worked.
    expect(formatCsv([['a', 'b,c'], ['say "hi"', 'two\nlines']])).toBe('a,"b,c"\r\n"say ""hi""","two\nlines"\r\n');
  });

  it('writes numbers as they are and nulls as empty cells', () => {
    expect(formatCsv([[41.37, null, 0]])).toBe('41.37,,0\r\n');
  });

  it('defuses a cell a spreadsheet would run as a formula', () => {
    // OWASP CSV injection guidance: prefix =, +, -, @ with a quote; negative numbers stay numbers.
    expect(formatCsv([['=HYPERLINK("x")', '-3', '@here', '+1+2']])).toBe(`"'=HYPERLINK(""x"")",-3,'@here,'+1+2\r\n`);
  });

  it('reads back to the same cells', () => {
    const rows = [['event', 'athletes'], ['Mixed double buck', 'Maren Ashgrove & Bram Dunmere'], ['x, "y"', '']];
    const parsed = parseCsv(formatCsv(rows));
    expect(parsed.ok && parsed.records.map((r) => r.fields)).toEqual(rows);
  });
});
