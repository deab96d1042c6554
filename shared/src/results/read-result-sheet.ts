import { parseCsv } from './parse-csv.js';
import { readHeader } from './sheet-columns.js';
import { sheetError, type SheetError } from './sheet-error.js';
import type { SheetRow } from './sheet-row.js';
import { readSheetRow } from './read-sheet-row.js';

export type ReadResultSheet = { ok: true; rows: SheetRow[] } | { ok: false; errors: SheetError[] };

/** The most data rows one sheet may hold: a big invitational is a few hundred. */
export const MAX_SHEET_ROWS = 20000;

/**
 * Reads a whole results sheet (CSV text): the header, then every data row. All problems are
 * collected, so the uploader sees every mistake in one go; any problem means no rows at all.
 */
export function readResultSheet(text: string): ReadResultSheet {
  const csv = parseCsv(text);
  if (!csv.ok) return { ok: false, errors: [sheetError(csv.row, 'file', csv.message)] };
  const [header, ...records] = csv.records;
  if (!header) return { ok: false, errors: [sheetError(1, 'file', 'the sheet is empty; the first row names the columns')] };
  if (header.row !== 1) return { ok: false, errors: [sheetError(1, 'file', 'the first row must name the columns')] };
  const head = readHeader(header.fields);
  if (!head.ok) return head;
  if (records.length === 0) return { ok: false, errors: [sheetError(2, 'file', 'the sheet has a header but no results')] };
  if (records.length > MAX_SHEET_ROWS) {
    return { ok: false, errors: [sheetError(MAX_SHEET_ROWS + 2, 'file', `a sheet holds at most ${MAX_SHEET_ROWS} results; split it`)] };
  }
  const rows: SheetRow[] = [];
  const errors: SheetError[] = [];
  for (const record of records) {
    if (record.fields.every((field) => field.trim() === '')) continue;
    if (record.fields.length > header.fields.length && record.fields.slice(header.fields.length).some((f) => f.trim() !== '')) {
      errors.push(sheetError(record.row, 'file', `${record.fields.length} cells but the header names ${header.fields.length} columns`));
      continue;
    }
    const cells = Object.fromEntries([...head.columns].map(([key, index]) => [key, record.fields[index] ?? '']));
    const read = readSheetRow(record.row, cells);
    if (read.ok) rows.push(read.value);
    else errors.push(...read.errors);
  }
  return errors.length ? { ok: false, errors } : { ok: true, rows };
}
