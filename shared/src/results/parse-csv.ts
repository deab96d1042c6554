export interface CsvRecord {
  /** 1-based, as a spreadsheet numbers its rows: the header is row 1; blank lines count. */
  row: number;
  fields: string[];
}

export type ParsedCsv = { ok: true; records: CsvRecord[] } | { ok: false; row: number; message: string };

const QUOTE = '"';

/**
 * Reads comma-separated text as RFC 4180 describes it: fields may be quoted, a quote inside a
 * quoted field is doubled, quoted fields may hold commas and line breaks. Lines end in CRLF,
 * LF or a lone CR (spreadsheets on every system write one of these). A leading byte-order mark
 * is dropped, a final line break does not make an empty record, and wholly empty lines are
 * skipped (but keep their row number). A stray quote inside an unquoted field, or an unclosed quote, is refused with the
 * record it sits in, rather than guessed at.
 */
export function parseCsv(text: string): ParsedCsv {
  const source = text.startsWith('\uFEFF') ? text.slice(1) : text;
  const records: CsvRecord[] = [];
  let fields: string[] = [];
  let field = '';
  let quoted = false;
  let fieldStarted = false;
  // A record of one quoted empty field ("") is a record, not a blank line.
  let quotedOnce = false;
  let row = 1;
  let index = 0;

  const endField = (): void => {
    fields.push(field);
    field = '';
    fieldStarted = false;
  };
  const endRecord = (): void => {
    endField();
    // A line with nothing on it is not a record (an empty line reads as one empty field).
    const blank = fields.length === 1 && fields[0] === '' && !quotedOnce;
    // A blank line still takes a row number, as it takes a row in a spreadsheet.
    if (!blank) records.push({ row, fields });
    row += 1;
    fields = [];
    quotedOnce = false;
  };

  while (index < source.length) {
    const char = source[index]!;
    if (quoted) {
      if (char === QUOTE) {
        if (source[index + 1] === QUOTE) {
          field += QUOTE;
          index += 2;
          continue;
        }
        quoted = false;
        const next = source[index + 1];
        if (next !== undefined && next !== ',' && next !== '\n' && next !== '\r') {
          return { ok: false, row, message: `a quoted field must end at a comma or the end of the line (found ${JSON.stringify(next)} after the closing quote)` };
        }
        index += 1;
        continue;
      }
      field += char;
      index += 1;
      continue;
    }
    if (char === QUOTE) {
      if (fieldStarted || field !== '') {
        return { ok: false, row, message: 'a quote inside an unquoted field; put the whole field in quotes and double the quote ("")' };
      }
      quoted = true;
      fieldStarted = true;
      quotedOnce = true;
      index += 1;
      continue;
    }
    if (char === ',') {
      endField();
      index += 1;
      continue;
    }
    if (char === '\r' || char === '\n') {
      endRecord();
      index += char === '\r' && source[index + 1] === '\n' ? 2 : 1;
      continue;
    }
    field += char;
    index += 1;
  }
  if (quoted) return { ok: false, row, message: 'a quoted field is never closed (a missing ")' };
  if (field !== '' || fieldStarted || fields.length > 0) endRecord();
  return { ok: true, records };
}
