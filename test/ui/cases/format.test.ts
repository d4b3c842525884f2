import { describe, expect, it } from 'vitest';
import type { Case } from '../../../src/case';
import { caseRowView, displayName, formatBytes, formatCaseDate, kindTitle, quotaWords } from '../../../src/ui/cases/format';
import { demoCase } from '../../case/fixtures';

/** A local time as ISO text, so the expected wording does not depend on the machine's time zone. */
function localIso(y: number, mo: number, d: number, h: number, mi: number): string {
  return new Date(y, mo, d, h, mi).toISOString();
}

describe('dates in the saved list', () => {
  it('show the local day, short month, year and 24-hour time', () => {
    expect(formatCaseDate(localIso(2026, 11, 1, 14, 5))).toBe('1 Dec 2026, 14:05');
    expect(formatCaseDate(localIso(2027, 0, 31, 0, 0))).toBe('31 Jan 2027, 00:00');
    expect(formatCaseDate(localIso(2026, 5, 9, 9, 7))).toBe('9 Jun 2026, 09:07');
  });
  it('say "date unknown" rather than "Invalid Date" for text that is not a time', () => {
    expect(formatCaseDate('yesterday')).toBe('date unknown');
    expect(formatCaseDate('')).toBe('date unknown');
  });
});

describe('byte counts', () => {
  it('use decimal units with one decimal from kB up', () => {
    expect(formatBytes(0)).toBe('0 B');
    expect(formatBytes(999)).toBe('999 B');
    expect(formatBytes(1000)).toBe('1.0 kB');
    expect(formatBytes(1_234_567)).toBe('1.2 MB');
    expect(formatBytes(2_100_000_000)).toBe('2.1 GB');
  });
  it('move up a unit instead of showing 1000.0 of the smaller one', () => {
    expect(formatBytes(999_960)).toBe('1.0 MB');
    expect(formatBytes(999_940)).toBe('999.9 kB');
  });
  it('do not print NaN for a value the browser did not give', () => {
    expect(formatBytes(Number.NaN)).toBe('an unknown amount');
    expect(formatBytes(-5)).toBe('an unknown amount');
  });
});

describe('the storage line', () => {
  it('says how much of the quota is used on this device', () => {
    expect(quotaWords({ supported: true, usageBytes: 1_200_000, quotaBytes: 2_100_000_000, usedFraction: 1.2e6 / 2.1e9 })).toBe(
      'Using 1.2 MB of 2.1 GB on this device',
    );
  });
  it('warns when the storage is nearly full and says what to do', () => {
    const w = quotaWords({ supported: true, usageBytes: 90_000_000, quotaBytes: 100_000_000, usedFraction: 0.9 });
    expect(w).toBe('Using 90.0 MB of 100.0 MB on this device (90 % — nearly full: export and delete cases you no longer need)');
  });
  it('is left out where the browser cannot say', () => {
    expect(quotaWords({ supported: false })).toBeNull();
  });
});

describe('a row of the saved list', () => {
  it('shows name, kind title, tag, date and the kept key result', () => {
    const c = demoCase();
    const v = caseRowView(c);
    expect(v).toMatchObject({ id: c.id, name: 'Pile B7 — east berth', kind: 'Pile', tag: 'FH-JTY-B7', frequency: '1.84 Hz', verdict: 'close', resultText: '1.84 Hz' });
    expect(v.updated).toBe(formatCaseDate(c.updatedAt));
  });
  it('calls a case without a name (or with only spaces) "Untitled"', () => {
    expect(caseRowView({ ...demoCase(), name: '' }).name).toBe('Untitled');
    expect(displayName({ name: '   ' })).toBe('Untitled');
  });
  it('says "not computed" when no result was kept, and "not kept" when only the verdict was', () => {
    const { keyResult: _k, ...bare } = demoCase();
    expect(caseRowView(bare as Case)).toMatchObject({ frequency: null, verdict: null, resultText: 'not computed' });
    expect(caseRowView({ ...demoCase(), keyResult: { verdict: 'clear' } })).toMatchObject({ frequency: null, verdict: 'clear', resultText: 'not kept' });
  });
  it('keeps a name with markup as the very same text (the component renders it as text, never as HTML)', () => {
    const name = '<img src=x onerror=alert(1)> & "pile"';
    expect(caseRowView({ ...demoCase(), name }).name).toBe(name);
  });
  it('uses the forms\u2019 titles for the member kinds', () => {
    expect(['pile', 'riser', 'baffle', 'stem'].map((k) => kindTitle(k as Case['kind']))).toEqual(['Pile', 'Riser or conductor', 'Tank baffle', 'Sensor stem']);
  });
});
