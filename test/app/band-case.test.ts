import { describe, expect, it } from 'vitest';
import { bandCase } from '../../src/app/band-case';
import { switchWords } from '../../src/app/band-words';
import { caseFromDemo } from '../../src/app/create-case';
import { DEMO_CASES, FORMS } from '../../src/kinds/registry';
import { solveMember } from '../../src/physics/beam';
import { memberBand } from '../../src/physics/uncertain';
import { withFixedMesh } from '../../src/physics/uncertain/evaluate';
import { expectClose } from '../helpers/expect-close';

const pileDemo = caseFromDemo(DEMO_CASES.find((d) => d.kind === 'pile')!);

describe('the band of a case over ranges typed in the form', () => {
  it('equals the core band on the model path the field drives (top mass -> masses.0.massKg) on the demo pile', () => {
    const c = { ...pileDemo, ranges: { topMass: { low: '9', high: '15', on: true } } };
    const a = bandCase(c);
    if (!a.ok || !a.band) throw new Error(a.ok ? 'no band' : a.message);
    const built = FORMS.pile.build(c.inputs, c.unitSystem);
    if (!built.ok) throw new Error('builds');
    const core = memberBand(built.build.model, [{ path: 'masses.0.massKg', low: 9000, high: 15000 }]);
    if (!core.ok) throw new Error(core.message);
    for (const s of ['dry', 'wet'] as const) {
      core.band[s]!.modes.forEach((m, j) => {
        const f = a.band![s]!.modes[j];
        // Cross-check by another route (paths instead of rebuilding): same model, same mesh, so the same numbers.
        expectClose(f.lowHz, m.lowHz, { rtol: 1e-12, label: `${s} mode ${j + 1} low` });
        expectClose(f.highHz, m.highHz, { rtol: 1e-12, label: `${s} mode ${j + 1} high` });
        expectClose(f.likelyHz, m.likelyHz, { rtol: 1e-12, label: `${s} mode ${j + 1} likely` });
      });
    }
    expect(a.band.method).toBe('corners');
    expect(a.band.sensitivity[0].path).toBe('topMass');
  });

  it('moves every model number a field drives: a fixity range gives the band of piles rebuilt at 3.5 and 8 diameters', () => {
    const c = { ...pileDemo, ranges: { fixityDepth: { low: '2.667', high: '6.096', on: true } } };
    const a = bandCase(c);
    if (!a.ok || !a.band) throw new Error(a.ok ? 'no band' : a.message);
    const likely = a.band.likely;
    const at = (depth: string) => {
      const b = FORMS.pile.build({ ...c.inputs, fixityDepth: depth }, 'si');
      if (!b.ok) throw new Error('builds');
      const s = solveMember(withFixedMesh(b.build.model, likely.mesh.elements));
      if (!s.ok) throw new Error(s.message);
      return s.result.wet!.frequenciesHz[0];
    };
    // Cross-check: a deeper fixity point lengthens the cantilever, so the frequency falls with depth (classical).
    expectClose(a.band.wet!.modes[0].highHz, at('2.667'), { rtol: 1e-12, label: 'wet mode 1 at 3.5 D' });
    expectClose(a.band.wet!.modes[0].lowHz, at('6.096'), { rtol: 1e-12, label: 'wet mode 1 at 8 D' });
    expect(a.band.sensitivity[0].direction).toBe('down');
  });

  it('judges the resonance over the band and words where it changes with the label and the user units', () => {
    const c = {
      ...pileDemo,
      excitation: { ...pileDemo.excitation, currentSurface: '0.3', currentMid: '0.2', currentBed: '0.1', wavePeriodMin: '1', wavePeriodMax: '1.5' },
      ranges: { fixityDepth: { low: '2.667', high: '6.096', on: true } },
    };
    const a = bandCase(c);
    if (!a.ok || !a.band || !a.verdict) throw new Error('a verdict over the band');
    expect(a.verdict.likelyVerdict).toBe('close');
    expect(a.verdict.bandVerdict).toBe('inside-band');
    const driver = a.verdict.checks.find((k) => k.switches.length > 0)!;
    const words = switchWords(driver.likely.verdict, driver.switches[0], a.ranges);
    expect(words).toMatch(/^close unless fixity depth below mudline is (below|above) \d+(\.\d+)? m \(then (inside band|clear)\)$/);
    expect(words).not.toContain('fixityDepth');
  });

  it('says which range does not read, and gives no band when no range is on', () => {
    const bad = bandCase({ ...pileDemo, ranges: { topMass: { low: '16', high: '15', on: true } } });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.errors.topMass).toContain('the range of top mass runs from 16 t to 15 t');
    expect(bandCase({ ...pileDemo, ranges: { topMass: { low: '9', high: '15', on: false } } })).toEqual({ ok: true, band: null, ranges: [] });
  });
});
