/** Severity beside the verdict: the mode factor, the Scruton number and the indicative A/D of the driving mode. */
import { describe, expect, it } from 'vitest';
import { readCase, requestOf, solveCase } from '../../../src/app';
import { excitationDefaults } from '../../../src/forms/excitation';
import { kindOf } from '../../../src/kinds/registry';
import { modeFactorOf } from '../../../src/physics/excitation/severity';
import { MODE_FACTOR } from '../../../src/physics/practice/severity';
import { severitySentence } from '../../../src/ui/results/summary';
import { expectClose } from '../../helpers/expect-close';

function sampled(f: (x: number) => number, n = 2000) {
  const zM = Array.from({ length: n + 1 }, (_, i) => i / n);
  return { zM, displacement: zM.map(f) };
}

describe('mode factor γ = |φ|max (∫φ²/∫φ⁴)^½', () => {
  it('is 1 for a rigid cylinder and 1.155 for a pinned–pinned sine mode', () => {
    // R.D. Blevins, Flow-Induced Vibration (1990) §3.4: γ = 1 rigid, 1.155 sine; exactly √(4/3) = 1.1547 for the sine.
    // Trapezoid rule on 2000 panels: rtol 1e-5.
    expectClose(modeFactorOf(sampled(() => 1)), MODE_FACTOR.rigid, { rtol: 1e-12, label: 'rigid' });
    expectClose(modeFactorOf(sampled((x) => Math.sin(Math.PI * x))), Math.sqrt(4 / 3), { rtol: 1e-5, label: 'sine' });
  });

  it('is 1.305 for a cantilever’s first mode', () => {
    // Clamped–free first mode, βL = 1.87510, σ = 0.734096 (R.D. Blevins, Formulas for Natural Frequency and Mode
    // Shape, Table 8-1); γ = 1.305 as tabulated in Blevins, Flow-Induced Vibration (1990) §3.4 (3 figures: rtol 1e-3).
    const b = 1.8751;
    const s = 0.734096;
    const phi = (x: number) => Math.cosh(b * x) - Math.cos(b * x) - s * (Math.sinh(b * x) - Math.sin(b * x));
    expectClose(modeFactorOf(sampled(phi)), MODE_FACTOR.cantilever, { rtol: 1e-3, label: 'cantilever' });
  });
});

describe('severity of the driving mode in a screening', () => {
  it('a riser inside the lock-in band gets its Scruton number and an indicative A/D, worked again by hand', () => {
    const k = kindOf('riser');
    const c = {
      kind: 'riser' as const,
      unitSystem: 'si' as const,
      inputs: k.form.defaults('si'),
      excitation: { ...excitationDefaults(k.resonance, 'si'), currentSurface: '1.5' },
    };
    const r = readCase(c);
    if (!r.ok || !r.excitation) throw new Error('case did not read');
    if (r.engine !== 'beam') throw new Error('a beam member');
    const a = solveCase(requestOf(r));
    if (!a.ok || a.engine === 'plate') throw new Error(JSON.stringify(a));
    if (!a.ok || !a.screening) throw new Error('no screening');
    const s = a.screening;
    expect(s.verdict).toBe('inside-band');
    const v = s.severity!;
    const p = s.modes[v.modeIndex].shedding!;
    // K_S = 4π m_e ζ / (ρ D²) (DNV-RP-C205 §9), cross-check from the point's own m_e and D with ζ = 0.005, ρ = 1025.
    const ks = (4 * Math.PI * p.effectiveMassKgPerM * 0.005) / (1025 * p.characteristicSizeM ** 2);
    expectClose(v.stabilityParameter, ks, { rtol: 1e-12, label: 'K_S' });
    // Blevins (1990) §3.4 fit, cross-check: A/D = 0.07γ/((K_S + 1.9) St²) · (0.3 + 0.72/((K_S + 1.9) St))^½.
    const d = ks + 1.9;
    const ad = ((0.07 * v.modeFactor) / (d * v.strouhal ** 2)) * Math.sqrt(0.3 + 0.72 / (d * v.strouhal));
    expectClose(v.amplitudeRatio, ad, { rtol: 1e-12, label: 'A/D' });
    // A mode spanning guided bays lies between the rigid and cantilever factors.
    expect(v.modeFactor).toBeGreaterThan(1);
    expect(v.modeFactor).toBeLessThan(1.6);
    expect(severitySentence(s)).toMatch(/^Indicative cross-flow amplitude at lock-in, mode 1: A\/D ≈ [0-9.]+ \(Scruton number K_S = .*Indicative only/);
  });

  it('no severity when the verdict is not driven by shedding', () => {
    const k = kindOf('riser');
    const c = { kind: 'riser' as const, unitSystem: 'si' as const, inputs: k.form.defaults('si'), excitation: { ...excitationDefaults(k.resonance, 'si'), currentSurface: '0', machineSpeed: '90 rpm' } };
    const r = readCase(c);
    if (!r.ok || !r.excitation) throw new Error('case did not read');
    if (r.engine !== 'beam') throw new Error('a beam member');
    const a = solveCase(requestOf(r));
    if (!a.ok || a.engine === 'plate') throw new Error(JSON.stringify(a));
    if (!a.ok || !a.screening) throw new Error('no screening');
    expect(a.screening.driver!.kind).toBe('machinery');
    expect(a.screening.severity).toBeNull();
  });
});
