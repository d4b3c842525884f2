/**
 * Reads numbers out of the lines of a logger's text file: finds the delimiter (comma, semicolon, tab or spaces)
 * and the decimal mark (point, or comma where the delimiter is not a comma) by trying each reading on the first
 * lines and keeping the one under which most of them read as rows of two or more numbers.
 */

/** One way of splitting a line into numbers. */
export interface TableDialect {
  delimiter: ',' | ';' | '\t' | ' ';
  decimalComma: boolean;
  /** Words for messages, e.g. "semicolon-separated, decimal comma". */
  label: string;
}

const DIALECTS: readonly TableDialect[] = [
  { delimiter: '\t', decimalComma: false, label: 'tab-separated' },
  { delimiter: '\t', decimalComma: true, label: 'tab-separated, decimal comma' },
  { delimiter: ';', decimalComma: false, label: 'semicolon-separated' },
  { delimiter: ';', decimalComma: true, label: 'semicolon-separated, decimal comma' },
  { delimiter: ',', decimalComma: false, label: 'comma-separated' },
  { delimiter: ' ', decimalComma: false, label: 'space-separated' },
  { delimiter: ' ', decimalComma: true, label: 'space-separated, decimal comma' },
];

/** Lines that carry no data: blank, or starting with #, % or // (common comment marks in logger exports). */
export function isSkippable(line: string): boolean {
  const t = line.trim();
  return t === '' || t.startsWith('#') || t.startsWith('%') || t.startsWith('//');
}

/** Splits a line into trimmed fields (surrounding double quotes removed). */
export function splitFields(line: string, d: TableDialect): string[] {
  const t = line.trim();
  const raw = d.delimiter === ' ' ? t.split(/\s+/) : t.split(d.delimiter);
  return raw.map((f) => f.trim().replace(/^"(.*)"$/, '$1').trim());
}

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A field as a number under the dialect, or NaN when it is not a plain decimal number. */
export function readNumber(field: string, d: TableDialect): number {
  const s = d.decimalComma ? field.replace(',', '.') : field;
  return NUMBER.test(s) ? Number(s) : Number.NaN;
}

/** Reads a line as numbers; null when any field is not a number. */
export function readRow(line: string, d: TableDialect): number[] | null {
  const fields = splitFields(line, d);
  const out: number[] = [];
  for (const f of fields) {
    const v = readNumber(f, d);
    if (!Number.isFinite(v)) return null;
    out.push(v);
  }
  return out;
}

/**
 * Picks the dialect under which the most of the sample lines read as rows of the same width (two or more numbers).
 * Ties go to the earlier dialect in the list (tab, semicolon, comma, spaces), the more specific delimiter first.
 * Returns null when no line reads as two or more numbers under any dialect.
 */
export function detectDialect(sampleLines: readonly string[]): { dialect: TableDialect; columns: number } | null {
  let best: { dialect: TableDialect; columns: number; score: number } | null = null;
  for (const d of DIALECTS) {
    const widths = new Map<number, number>();
    for (const line of sampleLines) {
      const row = readRow(line, d);
      if (row && row.length >= 2) widths.set(row.length, (widths.get(row.length) ?? 0) + 1);
    }
    for (const [columns, score] of widths) {
      if (!best || score > best.score || (score === best.score && best.dialect === d && columns > best.columns)) {
        best = { dialect: d, columns, score };
      }
    }
  }
  return best ? { dialect: best.dialect, columns: best.columns } : null;
}
