import Papa from 'papaparse';

/**
 * Cells a spreadsheet would read as a formula: a leading = + - @ (also their full-width forms, and after
 * spaces), or a leading tab or carriage return. papaparse writes such a cell quoted with a leading `'`,
 * so a job or panel named `=HYPERLINK(…)` stays text.
 */
const FORMULA_START = /^\s*[=+\-@\uFF1D\uFF0B\uFF0D\uFF20]|^[\t\r]/;

/** A table as CSV for spreadsheets: RFC 4180 quoting, CRLF lines, formulae defused, led by a BOM so that spreadsheet programs read UTF-8. */
export function toCsv(fields: string[], rows: (string | number)[][]): string {
  return '\ufeff' + Papa.unparse({ fields, data: rows }, { escapeFormulae: FORMULA_START, newline: '\r\n' });
}
