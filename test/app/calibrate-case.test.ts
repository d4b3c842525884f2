import { describe, expect, it } from 'vitest';
import { calibrateField } from '../../src/app/calibrate-case';
import { caseFromDemo } from '../../src/app/create-case';
import { DEMO_CASES, FORMS } from '../../src/kinds/registry';
import { solveMember } from '../../src/physics/beam';
import { calibrate } from '../../src/physics/uncertain';
import { expectClose } from '../helpers/expect-close';

const pileDemo = caseFromDemo(DEMO_CASES.find((d) => d.kind === 'pile')!);

/** The demo pile's wet mode-1 frequency with some fields changed (adaptive mesh), Hz. */
function wetHz(inputs: Record<string, string>): number {
  const built = FORMS.pile.build({ ...pileDemo.inputs, ...inputs }, pileDemo.unitSystem);
  if (!built.ok) throw new Error('builds');
  const out = solveMember(built.build.model);
  if (!out.ok) throw new Error(out.message);
  return out.result.wet!.frequenciesHz[0];
}

describe('back-calculation of a form field from a measured frequency', () => {
  it('recovers the top mass that made the "measured" frequency, and agrees with the core calibration on the model path', () => {
    const fm = wetHz({ topMass: '20 t' });
    const measured = { frequencyHz: fm, uncertaintyHz: 0.01 * fm, mode: 1, state: 'wet' as const };
    const a = calibrateField(pileDemo, measured, { key: 'topMass', low: 0, high: 60000 });
    if (!a.ok) throw new Error(a.message);
    // Round trip: the measurement was made at 20 t; the search uses one fixed mesh while the "measurement" used
    // the adaptive mesh (0.05 % on frequency), and f ∝ M^-1/2 roughly, so 0.5 % on the mass covers it.
    expectClose(a.value, 20000, { rtol: 5e-3, label: 'top mass, kg' });
    expect(a.inputs.topMass).not.toBe(pileDemo.inputs.topMass);
    // Cross-check by another route: the core's calibrate on the path the field drives, same search range.
    const built = FORMS.pile.build(pileDemo.inputs, pileDemo.unitSystem);
    if (!built.ok) throw new Error('builds');
    const core = calibrate(built.build.model, measured, { path: 'masses.0.massKg', low: 0, high: 60000 });
    if (!core.ok) throw new Error(core.message);
    // Both search one fixed mesh chosen from the ends of the range; they may differ by a refinement level.
    expectClose(a.value, core.value, { rtol: 5e-3, label: 'form field vs core path' });
    expectClose(a.interval[0], core.interval[0], { rtol: 1e-2, label: 'interval low' });
    expectClose(a.interval[1], core.interval[1], { rtol: 1e-2, label: 'interval high' });
    expect(a.interval[0]).toBeLessThan(a.value);
    expect(a.interval[1]).toBeGreaterThan(a.value);
  });

  it('recovers a fixity depth, which moves the length and every landmark of the member', () => {
    const fm = wetHz({ fixityDepth: '4.5 m' });
    const a = calibrateField(pileDemo, { frequencyHz: fm, uncertaintyHz: 0, mode: 1, state: 'wet' }, { key: 'fixityDepth', low: 2, high: 7 });
    if (!a.ok) throw new Error(a.message);
    // Round trip; fixed mesh against the adaptive mesh (0.05 % on frequency, f ∝ L^-2 roughly): 0.5 %.
    expectClose(a.value, 4.5, { rtol: 5e-3, label: 'fixity depth, m' });
  });

  it('refuses a measurement no value in the range can give, with the reachable frequencies', () => {
    const a = calibrateField(pileDemo, { frequencyHz: 500, uncertaintyHz: 1, mode: 1, state: 'wet' }, { key: 'topMass', low: 0, high: 60000 });
    expect(a.ok).toBe(false);
    if (a.ok || a.reason !== 'no-fit') throw new Error('expected no fit');
    expect(a.message).toMatch(/^no value of Top mass from 0 t to 60 t fits: mode 1 \(wet\) reaches only /);
    expect(a.reachableHz[1]).toBeLessThan(500);
  });

  it('refuses a field that is not a number field', () => {
    const a = calibrateField(pileDemo, { frequencyHz: 2, uncertaintyHz: 0, mode: 1, state: 'wet' }, { key: 'foundation', low: 0, high: 1 });
    expect(a).toEqual({ ok: false, reason: 'invalid-input', message: 'foundation is not a number field of this member' });
  });
});
