import { describe, expect, it } from '@jest/globals';

import { parseCsv } from './parse-csv.js';

// Check values hand-worked from the rules of RFC 4180 section 2 (fields, quoting, doubled quotes).
const fieldsOf = (text: string): string[][] => {
  const parsed = parseCsv(text);
  if (!parsed.ok) throw new Error(parsed.message);
  return parsed.records.map((record) => record.fields);
};

describe('parseCsv', () => {
  it('splits plain records on commas and line feeds', () => {
    // RFC 4180 §2 rules 1 and 4: records on separate lines, fields separated by commas.
    expect(fieldsOf('a,b,c\n1,2,3')).toEqual([['a', 'b', 'c'], ['1', '2', '3']]);
  });

  it('accepts CRLF, LF and lone CR line ends in one file', () => {
    // RFC 4180 §2 rule 1 names CRLF; spreadsheets on other systems write LF or CR.
    expect(fieldsOf('a,b\r\n1,2\n3,4\r5,6')).toEqual([['a', 'b'], ['1', '2'], ['3', '4'], ['5', '6']]);
  });

  it('does not make an empty record from a trailing line break', () => {
    // RFC 4180 §2 rule 2: the last record may or may not end in a line break.
    expect(fieldsOf('a,b\r\n1,2\r\n')).toEqual([['a', 'b'], ['1', '2']]);
    expect(fieldsOf('a,b\n1,2\n\n\n')).toEqual([['a', 'b'], ['1', '2']]);
  });

  it('drops a leading byte-order mark', () => {
    // Common practice: spreadsheet programs prefix UTF-8 exports with U+FEFF.
    expect(fieldsOf('\uFEFFevent,club\nx,y')).toEqual([['event', 'club'], ['x', 'y']]);
  });

  it('keeps commas and line breaks inside quoted fields', () => {
    // RFC 4180 §2 rule 6.
    expect(fieldsOf('"Lee, A & Kim, B","line one\r\nline two",z')).toEqual([['Lee, A & Kim, B', 'line one\r\nline two', 'z']]);
  });

  it('reads a doubled quote inside a quoted field as one quote', () => {
    // RFC 4180 §2 rule 7: "aaa","b""bb","ccc" holds b"bb.
    expect(fieldsOf('"aaa","b""bb","ccc"')).toEqual([['aaa', 'b"bb', 'ccc']]);
  });

  it('keeps empty fields, including a quoted empty field and an empty last field', () => {
    // Hand-worked: 4 commas-separated positions in 'a,,"",' → a, empty, empty, empty.
    expect(fieldsOf('a,,"",')).toEqual([['a', '', '', '']]);
    expect(fieldsOf('""')).toEqual([['']]);
  });

  it('numbers records as a spreadsheet numbers rows', () => {
    // Hand-worked: header is row 1; a quoted line break stays in row 2; the blank line is row 3
    // (skipped, but counted), so "d,e" is row 4.
    const parsed = parseCsv('h1,h2\n"a\nb",c\n\nd,e\n');
    expect(parsed).toEqual({
      ok: true,
      records: [
        { row: 1, fields: ['h1', 'h2'] },
        { row: 2, fields: ['a\nb', 'c'] },
        { row: 4, fields: ['d', 'e'] },
      ],
    });
  });

  it('refuses an unclosed quote and names the record', () => {
    // RFC 4180 §2 rule 5: a quoted field must be closed.
    expect(parseCsv('a,b\n"open,2\n3,4')).toEqual({ ok: false, row: 2, message: 'a quoted field is never closed (a missing ")' });
  });

  it('refuses a stray quote inside an unquoted field', () => {
    // RFC 4180 §2 rule 5: fields not enclosed in quotes may not contain quotes.
    const parsed = parseCsv('a,b\n12" pine,x');
    expect(parsed.ok).toBe(false);
    expect(parsed).toMatchObject({ row: 2 });
  });

  it('refuses text after a closing quote', () => {
    // RFC 4180 §2 rule 5: the closing quote ends the field.
    expect(parseCsv('"a"b,c')).toMatchObject({ ok: false, row: 1 });
  });

  it('reads an empty text as no records', () => {
    // Hand-worked: nothing to read.
    expect(fieldsOf('')).toEqual([]);
    expect(fieldsOf('\uFEFF')).toEqual([]);
  });
});
