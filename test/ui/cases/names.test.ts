import { describe, expect, it } from 'vitest';
import { CASE_LIMITS, parseCase } from '../../../src/case';
import { checkCaseName, copyName } from '../../../src/ui/cases/names';
import { cutText } from '../../../src/case';
import { demoCase } from '../../case/fixtures';

describe('the name offered for a copy', () => {
  it('is the name with " (copy)", or "Untitled (copy)" for a case without a name', () => {
    expect(copyName('Pile B7')).toBe('Pile B7 (copy)');
    expect(copyName('')).toBe('Untitled (copy)');
  });
  it('stays within the schema\u2019s name limit and never splits a character in two', () => {
    const long = 'x'.repeat(CASE_LIMITS.nameChars - 8) + '🌊🌊🌊';
    const name = copyName(long);
    expect(name.length).toBeLessThanOrEqual(CASE_LIMITS.nameChars);
    expect(name.endsWith(' (copy)')).toBe(true);
    // The store refuses a broken character (lone surrogate): the copy must pass the case parser.
    expect(parseCase({ ...demoCase(), name }).ok).toBe(true);
  });
  it('cuts text at a whole character', () => {
    expect(cutText('ab🌊', 3)).toBe('ab');
    expect(cutText('ab🌊', 4)).toBe('ab🌊');
    expect(cutText('abc', 2)).toBe('ab');
  });
});

describe('a typed name', () => {
  it('is trimmed and may be empty (shown as Untitled)', () => {
    expect(checkCaseName('  Pile B7  ')).toEqual({ ok: true, name: 'Pile B7' });
    expect(checkCaseName('   ')).toEqual({ ok: true, name: '' });
  });
  it('keeps markup as plain text', () => {
    expect(checkCaseName('<b>Pile</b>')).toEqual({ ok: true, name: '<b>Pile</b>' });
  });
  it('over the limit is refused with the limit and the length got', () => {
    expect(checkCaseName('a'.repeat(CASE_LIMITS.nameChars + 15))).toEqual({
      ok: false,
      message: `A name can have at most ${CASE_LIMITS.nameChars} characters; this one has ${CASE_LIMITS.nameChars + 15}.`,
    });
    expect(checkCaseName('a'.repeat(CASE_LIMITS.nameChars)).ok).toBe(true);
  });
  it('with a line break or a control character is refused with the reason', () => {
    expect(checkCaseName('Pile\nB7')).toEqual({ ok: false, message: 'A name must be one line; this one has a line break in it.' });
    expect(checkCaseName('Pile\u0007B7')).toEqual({
      ok: false,
      message: 'A name must be plain text; this one has an invisible control character in it (pasted from another program?).',
    });
    expect(checkCaseName('Pile\tB7').ok).toBe(true);
  });
  it('accepted here is accepted by the case parser', () => {
    for (const typed of ['Pile B7', '', '<script>alert(1)</script>', 'Ü-Boot Steg 3', 'a\tb', 'é'.repeat(CASE_LIMITS.nameChars)]) {
      const r = checkCaseName(typed);
      expect(r.ok).toBe(true);
      if (r.ok) expect(parseCase({ ...demoCase(), name: r.name }).ok).toBe(true);
    }
  });
});
