import { describe, expect, it } from 'vitest';
import { NEWER_VERSION_MESSAGE, type Case } from '../../src/case';
import { CASE_FILE_EXTENSION, caseFileName, caseFromFileText, caseToFileText, resultsToCsv } from '../../src/share';
import { MAX_CASE_FILE_CHARS } from '../../src/share/file';
import { baffleCase, demoCase, v0Case } from '../case/fixtures';

describe('case files', () => {
  it('round-trip the whole case, key result included', () => {
    for (const c of [demoCase(), baffleCase()]) expect(caseFromFileText(caseToFileText(c))).toEqual({ ok: true, value: c });
  });

  it('are indented JSON in our own schema, ending with a line break', () => {
    const text = caseToFileText(demoCase());
    expect(text.startsWith('{\n  "format": "wetmode-case",\n  "schemaVersion": 3,')).toBe(true);
    expect(text.endsWith('}\n')).toBe(true);
  });

  it('read a file with a byte-order mark, and an older file with its migration reported', () => {
    expect(caseFromFileText(`\uFEFF${caseToFileText(demoCase())}`)).toEqual({ ok: true, value: demoCase() });
    const old = caseFromFileText(JSON.stringify(v0Case()));
    expect(old.ok && old.migratedFrom).toBe(0);
  });

  it('refuse empty, non-JSON, huge, foreign and newer files with plain messages', () => {
    expect(caseFromFileText('  \n')).toEqual({ ok: false, message: 'this file is empty' });
    const notJson = caseFromFileText('name: pile');
    expect(notJson.ok === false && notJson.message.startsWith('this file is not a Wetmode case: it is not valid JSON (')).toBe(true);
    // The limit is 1 000 000 characters for the case plus 12 photos of at most 700 000 characters and 200 for their fields.
    expect(MAX_CASE_FILE_CHARS).toBe(1_000_000 + 12 * 700_200);
    expect(caseFromFileText('x'.repeat(MAX_CASE_FILE_CHARS + 1))).toEqual({
      ok: false,
      message: 'this file is too large to be a Wetmode case (9402401 characters; a case file has at most 9402400)',
    });
    expect(caseFromFileText('{"format":"spreadsheet"}')).toEqual({
      ok: false,
      message: 'this file is not a usable Wetmode case: format must be "wetmode-case" (this is not a Wetmode case), got "spreadsheet"',
    });
    expect(caseFromFileText(JSON.stringify({ ...demoCase(), schemaVersion: 4 }))).toEqual({ ok: false, message: NEWER_VERSION_MESSAGE });
    expect(caseFromFileText(undefined)).toEqual({ ok: false, message: 'this file could not be read as text' });
  });

  it('refuse to write a case that does not pass parseCase', () => {
    expect(() => caseToFileText({ ...demoCase(), id: 'x' } as Case)).toThrow(RangeError);
  });

  it('get a safe file name from the name, the tag or the kind', () => {
    expect(caseFileName(demoCase())).toBe('pile-b7-east-berth.wetmode.json');
    expect(caseFileName({ ...demoCase(), name: '../../Übergang <b>' })).toBe('ubergang-b.wetmode.json');
    expect(caseFileName({ ...demoCase(), name: '', tag: 'FH/7' })).toBe('fh-7.wetmode.json');
    expect(caseFileName({ ...demoCase(), name: '***' })).toBe(`pile${CASE_FILE_EXTENSION}`);
    expect(caseFileName({ ...demoCase(), name: 'a'.repeat(300) }).length).toBe(60 + CASE_FILE_EXTENSION.length);
  });
});

describe('resultsToCsv', () => {
  it('writes RFC 4180: every text cell quoted, inner quotes doubled, CRLF line ends', () => {
    // RFC 4180 §2 rules 1, 5, 6, 7.
    const csv = resultsToCsv([
      ['case', 'mode', 'wet frequency (Hz)'],
      ['Pile B7, east', 1, 1.8432],
      ['say "hi"', 2, 6.5],
      ['two\nlines', 3, null],
    ]);
    expect(csv).toBe('"case","mode","wet frequency (Hz)"\r\n"Pile B7, east",1,1.8432\r\n"say ""hi""",2,6.5\r\n"two\nlines",3,\r\n');
  });

  it('neutralises text that a spreadsheet would run as a formula, but leaves numbers as numbers', () => {
    // OWASP "CSV Injection": prefix cells starting with = + - @ tab or CR.
    const csv = resultsToCsv([['=HYPERLINK("http://x")', '+1', '-2', '@SUM(A1)', '\tx', '\rx', -2.5, 'ok=1']]);
    expect(csv).toBe(`"'=HYPERLINK(""http://x"")","'+1","'-2","'@SUM(A1)","'\tx","'\rx",-2.5,"ok=1"\r\n`);
  });

  it('writes booleans as words, non-finite numbers and missing values as empty cells, and a BOM when asked', () => {
    expect(resultsToCsv([[true, false, Number.NaN, Number.POSITIVE_INFINITY, undefined]])).toBe('true,false,,,\r\n');
    expect(resultsToCsv([['m³']], { excelBom: true })).toBe('\uFEFF"m³"\r\n');
    expect(resultsToCsv([])).toBe('');
  });

  it('writes numbers with a dot and full precision, whatever the locale', () => {
    expect(resultsToCsv([[0.1 + 0.2, 1e-7, 12345678.9]])).toBe('0.30000000000000004,1e-7,12345678.9\r\n');
  });
});
