/**
 * Reads a motion record from a logger's CSV or text file: a time column in seconds, then one to three acceleration
 * columns. Any common delimiter (comma, semicolon, tab, spaces); a decimal comma where the delimiter is not a comma;
 * optional header lines (names are used when they match the columns, never required); blank lines and lines
 * starting with #, % or // are skipped. Never throws: a file that does not read gives a reason and a message that
 * names the line, what was expected and what was got.
 */
import { checkRecordSize, RECORD_LIMITS, type RecordResult } from './record';
import { detectDialect, isSkippable, readNumber, readRow, splitFields, type TableDialect } from './text-table';

/** How many data-like lines are looked at to find the delimiter. */
const SAMPLE_LINES = 50;

export function parseMotionRecord(text: string): RecordResult {
  if (typeof text !== 'string') return { ok: false, reason: 'no-data', message: `expected the text of a CSV or text file, got ${typeof text}` };
  if (text.length > RECORD_LIMITS.maxChars) {
    return { ok: false, reason: 'too-large', message: `file too large: expected at most ${RECORD_LIMITS.maxChars} characters, got ${text.length}; cut the record to the part of interest` };
  }
  // A byte-order mark (spreadsheets on Windows write one) is not part of the first value.
  const lines = (text.charCodeAt(0) === 0xfeff ? text.slice(1) : text).split(/\r\n|\n|\r/);
  const content: number[] = []; // indices of lines that are not blank or comments
  for (let i = 0; i < lines.length; i++) if (!isSkippable(lines[i])) content.push(i);
  if (content.length === 0) return { ok: false, reason: 'no-data', message: 'no rows found: the file is empty or has only blank and comment lines' };
  if (content.length > RECORD_LIMITS.maxRows + 20) {
    return { ok: false, reason: 'too-large', message: `too many rows: expected at most ${RECORD_LIMITS.maxRows}, got ${content.length}; cut the record to the part of interest` };
  }

  const found = detectDialect(content.slice(0, SAMPLE_LINES).map((i) => lines[i]));
  if (!found) return noTable(lines, content);
  const { dialect, columns } = found;
  if (columns > 4) {
    const first = content.find((i) => readRow(lines[i], dialect)?.length === columns) ?? content[0];
    return {
      ok: false,
      reason: 'too-many-columns',
      message: `line ${first + 1}: expected a time column and one to three acceleration columns (2 to 4 numbers, ${dialect.label}), got ${columns} numbers; keep only time and acceleration`,
    };
  }

  // Header: the content lines before the first row of `columns` numbers.
  let start = 0;
  while (start < content.length && readRow(lines[content[start]], dialect)?.length !== columns) start++;
  const headerLine = start > 0 ? lines[content[start - 1]] : null;

  const n = content.length - start;
  const timeS = new Float64Array(n);
  const axes = Array.from({ length: columns - 1 }, () => new Float64Array(n));
  let bad = 0;
  let firstBad = '';
  let k = 0;
  for (let c = start; c < content.length; c++) {
    const li = content[c];
    const row = readRow(lines[li], dialect);
    if (!row || row.length !== columns) {
      if (bad === 0) firstBad = describeBadRow(li, lines[li], dialect, columns);
      bad++;
      continue;
    }
    timeS[k] = row[0];
    for (let a = 1; a < columns; a++) axes[a - 1][k] = row[a];
    k++;
  }
  if (bad > 0) {
    return { ok: false, reason: 'bad-rows', message: `${bad} row${bad === 1 ? '' : 's'} of ${n} do${bad === 1 ? 'es' : ''} not read as ${columns} numbers (${dialect.label}); the first is ${firstBad}` };
  }

  for (let i = 1; i < n; i++) {
    if (!(timeS[i] > timeS[i - 1])) {
      const li = content[start + i];
      return {
        ok: false,
        reason: 'time-not-increasing',
        message:
          `no time column: expected the first column to be time in seconds, increasing from row to row; ` +
          `at line ${li + 1} it goes from ${timeS[i - 1]} to ${timeS[i]}`,
      };
    }
  }
  const size = checkRecordSize(timeS);
  if (size) return { ok: false, ...size };

  const names = headerLine ? splitFields(headerLine, dialect) : [];
  const axisNames = axes.map((_, a) => (names.length === columns && names[a + 1] !== '' ? names[a + 1] : `axis ${a + 1}`));
  const notes = [`read ${n} rows of time and ${axes.length} acceleration column${axes.length === 1 ? '' : 's'} (${dialect.label}${headerLine ? `, ${start} header line${start === 1 ? '' : 's'}` : ''})`];
  return { ok: true, record: { timeS, axes, axisNames }, notes };
}

/** Message for a file in which no line reads as two or more numbers. */
function noTable(lines: string[], content: number[]): RecordResult {
  const single = content.find((i) => Number.isFinite(readNumber(lines[i].trim(), SINGLE)) || Number.isFinite(readNumber(lines[i].trim(), SINGLE_COMMA)));
  if (single !== undefined) {
    return {
      ok: false,
      reason: 'one-column',
      message: `line ${single + 1}: expected a time column in seconds and one to three acceleration columns, got one column ("${clip(lines[single])}")`,
    };
  }
  return {
    ok: false,
    reason: 'no-data',
    message: `no rows of numbers found: expected lines of a time in seconds and one to three accelerations separated by commas, semicolons, tabs or spaces; line ${content[0] + 1} reads "${clip(lines[content[0]])}"`,
  };
}

const SINGLE: TableDialect = { delimiter: ' ', decimalComma: false, label: '' };
const SINGLE_COMMA: TableDialect = { delimiter: ' ', decimalComma: true, label: '' };

function describeBadRow(index: number, line: string, d: TableDialect, columns: number): string {
  const fields = splitFields(line, d);
  const where = `line ${index + 1} ("${clip(line)}")`;
  if (fields.length !== columns) return `${where}: expected ${columns} fields, got ${fields.length}`;
  const at = fields.findIndex((f) => !Number.isFinite(readNumber(f, d)));
  return `${where}: expected a number in column ${at + 1}, got "${clip(fields[at])}"`;
}

function clip(s: string): string {
  const t = s.trim();
  return t.length > 60 ? `${t.slice(0, 57)}...` : t;
}
