/**
 * The sensor stem's practical inputs: shedding at the tip diameter of a tapered stem, flow speed from a flow rate
 * and the pipe bore, water temperature → density and viscosity, and a length shielded inside a nozzle.
 */
import { describe, expect, it } from 'vitest';
import { readCase, requestOf, solveCase } from '../../src/app';
import { excitationDefaults } from '../../src/forms/excitation';
import { kindOf } from '../../src/kinds/registry';
import { STEM_DEMO } from '../../src/kinds/stem/demo';
import { expectClose } from '../helpers/expect-close';

function stemCase(inputs: Record<string, string>, excitation: Record<string, string>) {
  const k = kindOf('stem');
  return {
    kind: 'stem' as const,
    unitSystem: 'si' as const,
    inputs: { ...k.form.defaults('si'), ...STEM_DEMO.values, ...inputs },
    excitation: { ...excitationDefaults(k.resonance, 'si'), ...STEM_DEMO.excitation, ...excitation },
  };
}

function screen(inputs: Record<string, string> = {}, excitation: Record<string, string> = {}) {
  const r = readCase(stemCase(inputs, excitation));
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  if (!r.excitation) throw new Error(JSON.stringify(r.excitationErrors));
  if (r.engine !== 'beam') throw new Error('a beam member');
  const a = solveCase(requestOf(r));
  if (!a.ok || a.engine === 'plate') throw new Error(JSON.stringify(a));
  if (!a.ok || !a.screening) throw new Error(JSON.stringify(a));
  return { build: r.build, screening: a.screening };
}

describe('a tapered stem sheds at its tip diameter', () => {
  it('the demo thermowell (25 → 19 mm) is screened with D = 19 mm at the tip, not the 22 mm mean', () => {
    const p = screen().screening.modes[0].shedding!;
    // The first mode moves most at the tip; thermowell practice takes the tip diameter for f_s
    // (ASME PTC 19.3 TW-2010, by name). Exact geometry: the tip piece is sized at its smaller end.
    expect(p.atZM).toBeCloseTo(0.18, 12);
    expectClose(p.characteristicSizeM, 0.019, { rtol: 1e-12, label: 'D at the tip' });
    // f_s = St·U/D (classical), with the St the screening chose.
    expectClose(p.sheddingFrequencyHz, (p.strouhal.value * 3.2) / 0.019, { rtol: 1e-12, label: 'f_s at the tip' });
  });
});

describe('the stem screen where shedding is fastest', () => {
  it('on a stem slimmer at its root (19 → 25 mm), the root governs the f_s/f_n screen', () => {
    const { screening } = screen({ rootDiameter: '19 mm', tipDiameter: '25 mm' });
    const check = screening.modes[0].checks.find((c) => c.kind === 'stem-frequency-ratio')!;
    // f_s = St·U/D is highest where D is least (classical): the root, D = 19 mm, z = 0.
    expect(check.reason).toMatch(/D = 0\.019 m, at z = 0 m where shedding is fastest, which governs/);
    // The lock-in checks stay where the mode moves most: the tip piece, sized at its smaller end.
    expect(screening.modes[0].shedding!.atZM).toBeCloseTo(0.18, 12);
  });

  it('on a stem tapering to its tip, the tip governs and nothing else is said', () => {
    const check = screen().screening.modes[0].checks.find((c) => c.kind === 'stem-frequency-ratio')!;
    expect(check.reason).toMatch(/D = 0\.019 m\)/);
    expect(check.reason).not.toMatch(/fastest/);
  });
});

describe('flow speed from a flow rate and the pipe bore', () => {
  it('50 m³/h in a 100 mm bore is U = Q/(π d²/4) = 1.76839 m/s at the stem', () => {
    // Hand-worked: 50/3600 = 0.0138889 m³/s; π/4 × 0.1² = 0.00785398 m²; U = 1.76839 m/s. rtol 1e-5 (6 figures).
    const p = screen({}, { flowSpeed: '', flowRate: '50 m^3/h', pipeBore: '100 mm' }).screening.modes[0].shedding!;
    expectClose(p.flowSpeedMPerS, 1.76839, { rtol: 1e-5, label: 'U from Q' });
  });

  it('says to clear one when both a speed and a flow rate are given, and asks for the bore with a flow rate', () => {
    const both = readCase(stemCase({}, { flowSpeed: '2', flowRate: '50 m^3/h', pipeBore: '100 mm' }));
    expect(both.excitationErrors.flowRate).toMatch(/either the flow speed or the flow rate/);
    const noBore = readCase(stemCase({}, { flowSpeed: '', flowRate: '50 m^3/h' }));
    expect(noBore.excitationErrors.pipeBore).toMatch(/pipe bore/);
  });
});

describe('water temperature and a length inside the nozzle', () => {
  it('water at 40 °C gives the table density to the added mass and its viscosity to the Reynolds number', () => {
    // CRC Handbook of Chemistry and Physics, Properties of water: 40 °C, ρ = 992.2 kg/m³, ν = 0.658 mm²/s.
    const { build, screening } = screen({ waterTemperature: '40' });
    expect(build.model.liquid!.densityKgPerM3).toBe(992.2);
    expect(screening.liquid.kinematicViscosityM2PerS).toBeCloseTo(0.658e-6, 15);
    expect(screening.liquid.source).toMatch(/water at 40 °C/);
    const p = screening.modes[0].shedding!;
    // Re = U D / ν (classical): 3.2 × 0.019 / 0.658e-6 = 92401.
    expectClose(p.reynoldsNumber, (3.2 * 0.019) / 0.658e-6, { rtol: 1e-9, label: 'Re at 40 °C' });
  });

  it('the stretch inside the nozzle sees no flow; the tip, where the mode moves most, still does', () => {
    const { screening } = screen({ shieldedLength: '40 mm' });
    const z0 = screening.zones[0];
    expect(z0.shieldedBy).toBe('inside the nozzle');
    expect(z0.speedMaxMPerS).toBe(0);
    expect(screening.modes[0].shedding!.flowSpeedMPerS).toBe(3.2);
  });
});
