import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { runCaseCommand } from '../../src/cli/case-command';
import { runMemberCommand } from '../../src/cli/member-command';

import { main } from '../../src/cli/main';
import { expectClose } from '../helpers/expect-close';
import { FORMS } from '../../src/kinds/registry';

const EXAMPLE = 'examples/case-port-halloran-pile.wetmode.json';

describe('wetmode case', () => {
  it('solves a saved case with the same numbers as the member command on the model its forms build', () => {
    const text = readFileSync(EXAMPLE, 'utf8');
    const out = JSON.parse(runCaseCommand(text));
    const c = JSON.parse(text);
    const built = FORMS.pile.build(c.inputs, c.unitSystem);
    if (!built.ok) throw new Error(JSON.stringify(built.errors));
    const member = JSON.parse(runMemberCommand(JSON.stringify(built.build.model)));
    expect(out.ok).toBe(true);
    expect(out.dry.frequenciesHz).toEqual(member.dry.frequenciesHz); // same code path, same 6-figure rounding
    expect(out.wet.frequenciesHz).toEqual(member.wet.frequenciesHz);
    expect(out.model).toEqual(JSON.parse(JSON.stringify(built.build.model, (_k, v) => (typeof v === 'number' && !Number.isInteger(v) ? Number(v.toPrecision(6)) : v))));
  });

  it('reads a case file that carries site photos and a location, with the same output as without them', () => {
    const text = readFileSync(EXAMPLE, 'utf8');
    const withEvidence = JSON.stringify({
      ...JSON.parse(text),
      siteEvidence: { photos: [{ dataUrl: 'data:image/jpeg;base64,/9j/4AAQ', takenAt: '2026-12-03T09:00:00Z', widthPx: 4, heightPx: 3 }], location: null },
    });
    expect(runCaseCommand(withEvidence)).toBe(runCaseCommand(text));
  });

  it('the demo pile in a 1.2 m/s current is inside the in-line lock-in band (DNV-RP-C205 §9: 1.0 ≤ V_R ≤ 4.5)', () => {
    const out = JSON.parse(runCaseCommand(readFileSync(EXAMPLE, 'utf8')));
    const inLine = out.resonance.checks.find((k: { mode: number; excitation: string }) => k.mode === 1 && k.excitation === 'in-line VIV');
    expect(inLine.verdict).toBe('inside-band');
    // Critical speed = V_R,min × f_n × D (DNV-RP-C205 §9, V_R = U / (f_n D)), with D = 0.762 m + 2 × 75 mm growth at the waterline.
    expectClose(inLine.criticalSpeedMPerS, 1.0 * out.wet.frequenciesHz[0] * 0.912, { rtol: 1e-5, label: 'in-line onset speed' });
    expect(out.cautions.join(' ')).toContain('qualified engineer');
  });

  it('prints the measured frequencies and their notes kept with the case', () => {
    const c = JSON.parse(readFileSync(EXAMPLE, 'utf8'));
    // An invented measurement; the case file carries its frequency and notes, never a motion record.
    const m = { id: '0b9e4c7a-1f2d-4e3b-8a6c-5d7e9f1a2b3c', takenAt: '2026-05-02T07:40:00.000Z', by: 'tablet on the pile head', elevation: '', waterLevel: '+0.8 m', frequencyHz: 0.59, uncertaintyHz: 0.02, mode: 1, state: 'wet', source: 'record', note: 'calm' };
    const out = JSON.parse(runCaseCommand(JSON.stringify({ ...c, schemaVersion: 3, measurements: [m] })));
    expect(out.measurements).toEqual([m]);
    expect(JSON.parse(runCaseCommand(JSON.stringify(c))).measurements).toEqual([]);
  });

  it('bad files say what was expected and what was got, and exit non-zero', async () => {
    expect(() => runCaseCommand('{ not json')).toThrow(/not valid JSON/);
    expect(() => runCaseCommand(JSON.stringify({ format: 'something-else' }))).toThrow(/not a usable Wetmode case/);
    const bad = JSON.parse(readFileSync(EXAMPLE, 'utf8'));
    bad.inputs.wallThickness = '500 mm';
    expect(() => runCaseCommand(JSON.stringify(bad))).toThrow(/wallThickness: wall thickness must be less than half the outer diameter \(381 mm\)/);
    const err: string[] = [];
    const code = await main(['case', 'no/such/file.json'], () => undefined, (s) => err.push(s));
    expect(code).toBe(1);
    expect(err.join('')).toContain('no such file');
  });

  it('prints the band over the ranges entered in the app, by field and label, and refuses a range that does not read', () => {
    const c = JSON.parse(readFileSync(EXAMPLE, 'utf8'));
    expect(JSON.parse(runCaseCommand(JSON.stringify(c))).band).toBeNull();
    c.ranges = { topMass: { low: '9', high: '15', on: true } };
    const out = JSON.parse(runCaseCommand(JSON.stringify(c)));
    expect(out.band.ok).toBe(true);
    expect(out.band.ranges).toEqual([{ field: 'topMass', label: 'Top mass', low: 9000, likely: 12000, high: 15000 }]);
    // A heavier top mass lowers the first mode (classical): the band holds the likely value and runs below it at 15 t.
    expect(out.band.wet.lowHz[0]).toBeLessThan(out.wet.frequenciesHz[0]);
    expect(out.band.wet.highHz[0]).toBeGreaterThan(out.wet.frequenciesHz[0]);
    expect(out.band.sensitivity[0]).toMatchObject({ field: 'topMass', label: 'Top mass', direction: 'down' });
    expect(['clear', 'close', 'inside-band']).toContain(out.band.resonance.bandVerdict);
    c.ranges.topMass.low = '13';
    expect(() => runCaseCommand(JSON.stringify(c))).toThrow(/topMass: top mass \(12 t\) lies outside its range 13 t to 15 t/);
  });
});
