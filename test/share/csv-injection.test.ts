/**
 * CSV injection across separators: a spreadsheet may split our comma-separated file on `;` or tab (European
 * locales, "Text to columns", paste), honouring quotes or not. Whatever way it cuts, no piece of a text cell may
 * start with a formula character (OWASP "CSV Injection": cells starting with = + - @ are run as formulas).
 */
import { describe, expect, it } from 'vitest';
import { resultsToCsv } from '../../src/share';
import { defuseCell } from '../../src/share/csv';
import { resultCsvRows } from '../../src/ui/cases/results-csv';
import { demoCase } from '../case/fixtures';

const HOSTILE = [
  'Pile P7;=HYPERLINK("http://x","click")',
  'Pile P7; =1+1',
  'note\t=cmd|\' /C calc\'!A0',
  'two\n=lines',
  'two\r\n+lines',
  'a,@SUM(A1)',
  '-2 m',
  '@me',
  'x;\u00a0-1',
  'ok=1; fine',
];

/** Splits like a spreadsheet does: with quotes honoured (a quoted run is one piece), or naively. */
function cells(csv: string, sep: string, quotes: boolean): string[] {
  const out: string[] = [];
  let cur = '';
  let inQ = false;
  for (let i = 0; i < csv.length; i++) {
    const ch = csv[i];
    if (quotes && ch === '"') {
      if (inQ && csv[i + 1] === '"') {
        cur += '"';
        i++;
      } else inQ = !inQ;
      continue;
    }
    if (!inQ && (ch === sep || ch === '\r' || ch === '\n')) {
      out.push(cur);
      cur = '';
      continue;
    }
    cur += ch;
  }
  out.push(cur);
  return out;
}

/** What a spreadsheet would run as a formula: a piece that (after spaces, and any quote left by a naive split) starts with = + - @, and is not a number. */
function runsAsFormula(piece: string): boolean {
  const t = piece.replace(/^[\s\u00a0"]+/, '');
  return /^[=+\-@]/.test(t) && !Number.isFinite(Number(t.replace(/"$/, '')));
}

describe('CSV cells read as text under comma, semicolon and tab separators', () => {
  it('no piece of any hostile cell runs as a formula, whichever way it is split', () => {
    // Numbers stay bare; a row never starts with a negative number in our exports (labels or mode numbers come first).
    const csv = resultsToCsv([HOSTILE, [3, -2.5, 'x']]);
    for (const sep of [',', ';', '\t']) {
      for (const quotes of [true, false]) {
        const bad = cells(csv, sep, quotes).filter(runsAsFormula);
        expect(bad, `separator ${JSON.stringify(sep)}, quotes ${quotes}`).toEqual([]);
      }
    }
  });

  it('the checker catches the cells the old start-only apostrophe left open (the test can fail)', () => {
    const old = `"'Pile P7;=HYPERLINK(""x"")"`;
    expect(cells(old, ';', false).some(runsAsFormula)).toBe(true);
  });

  it('a case named with a formula after a semicolon exports as text through the results rows', () => {
    const doc = { ...demoCase(), name: 'Pile P7;=HYPERLINK("http://x")', tag: 'T\t+1', note: '' };
    const csv = resultsToCsv(resultCsvRows(doc, null, '2026-12-01T00:00:00.000Z'));
    for (const sep of [',', ';', '\t']) for (const quotes of [true, false]) expect(cells(csv, sep, quotes).filter(runsAsFormula)).toEqual([]);
    expect(csv).toContain(`"Pile P7;'=HYPERLINK(""http://x"")"`);
  });

  it('defuseCell leaves ordinary text alone and marks only formula starts', () => {
    expect(defuseCell('Pile B7, east')).toBe('Pile B7, east');
    expect(defuseCell('ok=1; fine')).toBe('ok=1; fine');
    expect(defuseCell('a; =b')).toBe("a; '=b");
    expect(defuseCell('=a\n-b')).toBe("'=a\n'-b");
  });
});
