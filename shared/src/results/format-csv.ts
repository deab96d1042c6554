const NEEDS_QUOTES = /[",\r\n]/;
// A cell a spreadsheet would run as a formula (OWASP's CSV-injection advice); plain numbers pass.
const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^-?\d+(\.\d+)?$/;

/** Writes rows as RFC 4180 CSV (CRLF line ends), quoting where needed and defusing formulas. */
export function formatCsv(rows: readonly (readonly (string | number | null)[])[]): string {
  return rows.map((row) => row.map(formatCell).join(',')).join('\r\n') + '\r\n';
}

function formatCell(value: string | number | null): string {
  if (value === null) return '';
  let text = String(value);
  if (FORMULA_START.test(text) && !PLAIN_NUMBER.test(text)) text = `'${text}`;
  return NEEDS_QUOTES.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}
