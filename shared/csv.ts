/**
 * CSV for spreadsheets, written so that no cell can run as a formula. A text cell that starts with `=`, `+`, `-`,
 * `@`, a tab or a carriage return is read by spreadsheet programs as a formula (or as the start of one), so it is
 * prefixed with a single quote, as OWASP's CSV-injection guidance advises; the quote shows that the cell is text.
 * Numbers are written as numbers: a negative figure keeps its minus sign and stays a number.
 */
export type CsvValue = string | number;

const FORMULA_START = /^[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",\r\n]/;

/** One cell: text made inert and quoted where it holds a separator, a quote or a line break. */
export function csvCell(value: CsvValue): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const text = FORMULA_START.test(value) ? `'${value}` : value;
  return NEEDS_QUOTES.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A whole file: one line per row, CRLF line ends (RFC 4180), ending with a line break. */
export function toCsv(rows: readonly (readonly CsvValue[])[]): string {
  return rows.map((row) => row.map(csvCell).join(',')).join('\r\n') + '\r\n';
}
