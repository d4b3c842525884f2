import { describe, expect, it } from 'vitest';
import { NEWER_VERSION_MESSAGE } from '../../../src/case';
import { caseFromFileText, caseToFileText } from '../../../src/share/file';
import { MAX_IMPORT_BYTES, importOutcome, importReadProblem, importSizeProblem } from '../../../src/ui/cases/import-file';
import { demoCase, v0Case } from '../../case/fixtures';

const open = (name: string, text: string) => importOutcome(name, caseFromFileText(text));

describe('importing a case file', () => {
  it('opens a good file and says it is not in the cases until saved', () => {
    const r = open('pile-b7.wetmode.json', caseToFileText(demoCase()));
    expect(r).toEqual({
      ok: true,
      value: demoCase(),
      message: 'Opened “Pile B7 — east berth” from “pile-b7.wetmode.json”. It is not in your cases until you save it.',
    });
  });
  it('says when an older file was brought up to date', () => {
    const r = open('old.json', JSON.stringify(v0Case()));
    expect(r.ok && r.message).toMatch(/It was made with an older Wetmode \(case version 0\) and has been brought up to date\.$/);
  });
  it('refuses a file that is not JSON, naming the file and what was expected', () => {
    const r = open('field-sheet.txt', 'name: pile');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/^Could not open “field-sheet\.txt”: this file is not a Wetmode case: it is not valid JSON \(.*\)\.$/);
  });
  it('refuses JSON that is not a case, with the parser\u2019s reason', () => {
    const r = open('survey-log.json', '{"entries": []}');
    expect(!r.ok && r.message.startsWith('Could not open “survey-log.json”: this file is not a usable Wetmode case: ')).toBe(true);
  });
  it('refuses a file from a newer Wetmode with "update the app"', () => {
    const r = open('new.wetmode.json', JSON.stringify({ ...demoCase(), schemaVersion: 99 }));
    expect(r).toEqual({ ok: false, message: `Could not open “new.wetmode.json”: ${NEWER_VERSION_MESSAGE}.` });
  });
  it('refuses an empty or a huge file before reading it, with the size got', () => {
    expect(importSizeProblem('empty.json', 0)).toBe('Could not open “empty.json”: expected a Wetmode case file (.wetmode.json); got an empty file.');
    expect(importSizeProblem('site-photos.zip', 35_000_000)).toBe(
      'Could not open “site-photos.zip”: expected a Wetmode case file (.wetmode.json) of a few kB, up to about 12.4 MB with site photos; got a file of 35.0 MB.',
    );
    expect(importSizeProblem('case.json', MAX_IMPORT_BYTES)).toBeNull();
    expect(importSizeProblem('case.json', MAX_IMPORT_BYTES + 1)).not.toBeNull();
  });
  it('shortens a very long file name in its messages, and copes with none', () => {
    const long = `${'a'.repeat(100)}.json`;
    expect(importSizeProblem(long, 0)).toBe(`Could not open “${'a'.repeat(57)}…”: expected a Wetmode case file (.wetmode.json); got an empty file.`);
    expect(importSizeProblem('', 0)).toMatch(/^Could not open the file: /);
  });
  it('says when the browser could not read the file at all', () => {
    expect(importReadProblem('c.json', new Error('NotReadableError'))).toBe('Could not open “c.json”: the browser could not read it (NotReadableError).');
    expect(importReadProblem('c.json', 'x')).toBe('Could not open “c.json”: the browser could not read it.');
  });
  it('shows a name with markup as the same text in its message', () => {
    const name = '<img src=x onerror=alert(1)>';
    const r = open('x.json', caseToFileText({ ...demoCase(), name }));
    expect(r.ok && r.message.startsWith(`Opened “${name}”`)).toBe(true);
  });
});
