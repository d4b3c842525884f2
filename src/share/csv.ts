/**
 * Results as CSV for spreadsheets: RFC 4180 (comma separator, CRLF line ends, fields with a comma, quote or
 * line break wrapped in double quotes with inner quotes doubled). Text cells that a spreadsheet would run as a
 * formula — starting with =, +, -, @, tab or carriage return — get a leading apostrophe (the usual CSV-injection
 * defence, OWASP "CSV Injection"). Numbers are written as numbers: pass numbers, not numeric text, so that
 * negative values stay numbers.
 */

export type CsvCell = string | number | boolean | null | undefined;

export interface CsvOptions {
  /** Start with a UTF-8 byte-order mark so Excel reads "m³" and "—" correctly. Default false. */
  excelBom?: boolean;
}

const FORMULA_START = /^[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",\r\n]/;

function cell(v: CsvCell): string {
  if (v === null || v === undefined) return '';
  // Shortest exact decimal form, always with "." (independent of the user's locale).
  if (typeof v === 'number') return Number.isFinite(v) ? String(v) : '';
  if (typeof v === 'boolean') return v ? 'true' : 'false';
  const safe = FORMULA_START.test(v) ? `'${v}` : v;
  return NEEDS_QUOTES.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** Rows of cells (the first row is usually the header) to CSV text ending in CRLF. Non-finite numbers become empty cells. */
export function resultsToCsv(rows: readonly (readonly CsvCell[])[], options: CsvOptions = {}): string {
  const text = rows.map((r) => r.map(cell).join(',') + '\r\n').join('');
  return options.excelBom ? `\uFEFF${text}` : text;
}
