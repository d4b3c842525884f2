import { describe, expect, it } from 'vitest';

import { resultsToCsv } from '../../../src/share/csv';
import { caseFromDemo } from '../../../src/app/create-case';
import { csvFileName, csvNumber, resultCsvRows } from '../../../src/ui/cases/results-csv';
import { solveDoc } from './solve';
import { DEMO_CASES } from '../../../src/kinds/registry';

const pile = caseFromDemo(DEMO_CASES.find((d) => d.kind === 'pile')!);
const answer = solveDoc(pile);
const AT = '2026-12-01T14:05:00.000Z';

describe('results as CSV rows', () => {
  it('start with the case, then the inputs as entered with the unit a bare number takes', () => {
    const rows = resultCsvRows(pile, answer, AT);
    expect(rows.slice(0, 6)).toEqual([
      ['Wetmode results'],
      ['Case', pile.name],
      ['Tag', pile.tag],
      ['Member kind', 'Pile'],
      ['Units', 'SI'],
      ['Exported', AT],
    ]);
    expect(rows).toContainEqual(['Outer diameter', '762 mm', 'mm']);
    // Choice fields show the option's words, not its code.
    expect(rows.some((r) => r[1] === 'carbon-steel')).toBe(false);
  });

  it('have one row per mode, with numbers as numbers, matching the solver to 6 significant figures', () => {
    expect(answer.ok).toBe(true);
    if (!answer.ok) return;
    const rows = resultCsvRows(pile, answer, AT);
    const head = rows.findIndex((r) => r[0] === 'Mode' && r[1] === 'Dry frequency (Hz)');
    expect(head).toBeGreaterThan(0);
    const n = answer.member.dry.frequenciesHz.length;
    for (let i = 0; i < n; i++) {
      const row = rows[head + 1 + i];
      expect(row[0]).toBe(i + 1);
      // Rounding to 6 significant figures: relative change below 5e-6 (half a unit in the 6th figure).
      expect(Math.abs((row[1] as number) / answer.member.dry.frequenciesHz[i] - 1)).toBeLessThan(5e-6);
      expect(Math.abs((row[3] as number) / answer.member.wet!.frequenciesHz[i] - 1)).toBeLessThan(5e-6);
      // Added mass lowers the frequency: the wet/dry ratio of a flooded pile in seawater is below 1 (classical).
      expect(row[5] as number).toBeLessThan(1);
    }
  });

  it('give the resonance verdict in words and one row per check with its source', () => {
    if (!answer.ok || !answer.screening) throw new Error('the demo pile has resonance inputs and should be screened');
    const rows = resultCsvRows(pile, answer, AT);
    expect(rows).toContainEqual(['Resonance verdict', expect.stringMatching(/^(clear|close|inside band)$/)]);
    const checks = answer.screening.modes.reduce((s, m) => s + m.checks.length, 0);
    const head = rows.findIndex((r) => r[1] === 'Excitation');
    expect(rows.slice(head + 1, head + 1 + checks).every((r) => typeof r[6] === 'string' && (r[6] as string).length > 0)).toBe(true);
  });

  it('say why there are no results for a case not computed or refused by the solver', () => {
    expect(resultCsvRows(pile, null, AT).at(-1)).toEqual(['No results', 'the case has not been computed']);
    expect(resultCsvRows(pile, { ok: false, reason: 'buckles', message: 'the member buckles under its own weight' }, AT).at(-1)).toEqual([
      'No results',
      'the member buckles under its own weight',
    ]);
  });

  it('keep a name that looks like a formula from running in a spreadsheet', () => {
    const csv = resultsToCsv(resultCsvRows({ ...pile, name: '=HYPERLINK("http://x")' }, null, AT));
    expect(csv).toContain(`"Case","'=HYPERLINK(""http://x"")"\r\n`);
  });

  it('round numbers to six significant figures and leave non-finite values empty', () => {
    expect(csvNumber(1.234567891)).toBe(1.23457);
    expect(csvNumber(-0.000123456789)).toBe(-0.000123457);
    expect(csvNumber(Number.NaN)).toBeNull();
    expect(csvNumber(null)).toBeNull();
  });

  it('are saved under the case file\u2019s name with -results.csv', () => {
    expect(csvFileName({ ...pile, name: 'Pile B7 — east berth' })).toBe('pile-b7-east-berth-results.csv');
  });
});
