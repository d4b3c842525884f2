/**
 * Results as CSV for spreadsheets: RFC 4180 (comma separator, CRLF line ends, inner quotes doubled), with every
 * text cell in double quotes. Text a spreadsheet would run as a formula gets an apostrophe before the formula
 * character (the usual CSV-injection defence, OWASP "CSV Injection"): at the start of the cell, and also after
 * any `;`, `,`, tab or line break inside it — a spreadsheet set to split on `;` or tab (common in European
 * locales) cuts the cell there, and the piece would otherwise start with =, +, - or @. Numbers are written as
 * numbers: pass numbers, not numeric text, so that negative values stay numbers.
 */

export type CsvCell = string | number | boolean | null | undefined;

export interface CsvOptions {
  /** Start with a UTF-8 byte-order mark so Excel reads "m³" and "—" correctly. Default false. */
  excelBom?: boolean;
}

/** A cell start (or a place a spreadsheet may cut the cell) followed, after any spaces, by a formula character. */
const FORMULA_AT_CUT = /(^|[;,\t\r\n])([ \u00a0]*)(?=[=+\-@\t\r])/g;

/** Puts an apostrophe wherever a piece of the cell, cut at a separator or line break, would start a formula. */
export function defuseCell(text: string): string {
  return text.replace(FORMULA_AT_CUT, (_m, cut: string, spaces: string) => `${cut}${spaces}'`);
}

function cell(v: CsvCell): string {
  if (v === null || v === undefined) return '';
  // Shortest exact decimal form, always with "." (independent of the user's locale).
  if (typeof v === 'number') return Number.isFinite(v) ? String(v) : '';
  if (typeof v === 'boolean') return v ? 'true' : 'false';
  return `"${defuseCell(v).replace(/"/g, '""')}"`;
}

/** Rows of cells (the first row is usually the header) to CSV text ending in CRLF. Non-finite numbers become empty cells. */
export function resultsToCsv(rows: readonly (readonly CsvCell[])[], options: CsvOptions = {}): string {
  const text = rows.map((r) => r.map(cell).join(',') + '\r\n').join('');
  return options.excelBom ? `\uFEFF${text}` : text;
}
