import { describe, expect, it } from 'vitest';
import { parseMotionRecord, RECORD_LIMITS } from '../../../src/physics/signal';

/** n rows at 100 Hz: time, then 1 to 3 columns of a slow sine, written with the given delimiter and decimal mark. */
function table(n: number, columns: number, delimiter: string, decimalComma = false): string[] {
  const num = (v: number) => (decimalComma ? v.toFixed(5).replace('.', ',') : v.toFixed(5));
  return Array.from({ length: n }, (_, i) => [i / 100, ...Array.from({ length: columns }, (_, c) => Math.sin(i / (7 + c)))].map(num).join(delimiter));
}

function read(text: string) {
  const r = parseMotionRecord(text);
  if (!r.ok) throw new Error(`expected the record to read, got: ${r.message}`);
  return r;
}

function fail(text: string) {
  const r = parseMotionRecord(text);
  if (r.ok) throw new Error('expected the record to be refused');
  return r;
}

describe('reading a motion record from a logger file', () => {
  it('reads comma-separated time and three axes with a header naming them', () => {
    const r = read(['time_s,ax,ay,az', ...table(300, 3, ',')].join('\n'));
    expect(r.record.axes.length).toBe(3);
    expect(r.record.axisNames).toEqual(['ax', 'ay', 'az']);
    expect(r.record.timeS.length).toBe(300);
    expect(r.record.timeS[299]).toBeCloseTo(2.99, 12);
    expect(r.record.axes[2][10]).toBeCloseTo(Math.sin(10 / 9), 5);
    expect(r.notes[0]).toContain('comma-separated, 1 header line');
  });

  it('reads semicolon-separated rows with a decimal comma, Windows line ends and no header', () => {
    const r = read(table(300, 2, ';', true).join('\r\n'));
    expect(r.record.axes.length).toBe(2);
    expect(r.record.axisNames).toEqual(['axis 1', 'axis 2']);
    expect(r.record.axes[0][50]).toBeCloseTo(Math.sin(50 / 7), 5);
    expect(r.notes[0]).toContain('semicolon-separated, decimal comma');
  });

  it('reads tab-separated and space-separated rows, skipping comments and blank lines', () => {
    const tab = read(['# logger LX-2, Port Halloran quay, pile P14', '', ...table(300, 1, '\t')].join('\n'));
    expect(tab.record.axes.length).toBe(1);
    expect(tab.notes[0]).toContain('tab-separated');
    const lines = table(300, 3, '   ', true);
    lines.splice(100, 0, '% operator note: tapped again', '');
    const spaces = read(['t ax ay az', 's m/s2 m/s2 m/s2', ...lines].join('\n'));
    expect(spaces.record.timeS.length).toBe(300);
    expect(spaces.notes[0]).toContain('space-separated, decimal comma, 2 header lines');
  });

  it('ignores a byte-order mark before the first value', () => {
    const r = read('\uFEFF' + table(300, 1, ';', true).join('\n'));
    expect(r.record.timeS[0]).toBe(0);
    expect(r.record.axes.length).toBe(1);
  });

  it('counts the rows that do not read and names the first, with what was expected and what was got', () => {
    const lines = table(300, 3, ',');
    lines[40] = '0.40,0.1,oops,0.3';
    lines[41] = '0.41,0.1,0.2';
    const r = fail(['t,x,y,z', ...lines].join('\n'));
    expect(r.reason).toBe('bad-rows');
    expect(r.message).toBe('2 rows of 300 do not read as 4 numbers (comma-separated); the first is line 42 ("0.40,0.1,oops,0.3"): expected a number in column 3, got "oops"');
  });

  it('says when the file has only one column', () => {
    const r = fail(['acceleration', ...Array.from({ length: 200 }, (_, i) => String(Math.sin(i)))].join('\n'));
    expect(r.reason).toBe('one-column');
    expect(r.message).toMatch(/^line 2: expected a time column in seconds and one to three acceleration columns, got one column \("0"\)$/);
  });

  it('says when the first column is not an increasing time', () => {
    const lines = table(300, 2, ',').map((l) => l.split(',').reverse().join(','));
    const r = fail(lines.join('\n'));
    expect(r.reason).toBe('time-not-increasing');
    expect(r.message).toMatch(/^no time column: expected the first column to be time in seconds, increasing from row to row; at line \d+ it goes from /);
  });

  it('refuses too few samples, too short a record, too many columns and an empty file, saying what was expected', () => {
    expect(fail(table(40, 1, ',').join('\n')).message).toBe(`too few samples: expected at least ${RECORD_LIMITS.minSamples}, got 40`);
    const fast = Array.from({ length: 100 }, (_, i) => `${i / 1000},${Math.sin(i)}`).join('\n');
    expect(fail(fast).message).toMatch(/^record too short: expected at least 2 s from first to last sample, got 0\.099 s/);
    expect(fail(table(300, 5, ',').join('\n')).message).toBe('line 1: expected a time column and one to three acceleration columns (2 to 4 numbers, comma-separated), got 6 numbers; keep only time and acceleration');
    expect(fail('\n# nothing here\n').reason).toBe('no-data');
    expect(fail('hello\nworld').message).toMatch(/^no rows of numbers found: .* line 1 reads "hello"$/);
  });

  it('refuses a file over the size limit before reading it', () => {
    const r = fail('0'.repeat(RECORD_LIMITS.maxChars + 1));
    expect(r.reason).toBe('too-large');
    expect(r.message).toContain(`expected at most ${RECORD_LIMITS.maxChars} characters`);
  });
});
