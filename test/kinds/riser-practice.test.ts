/**
 * The riser's practical inputs: shielding inside a caisson, effective tension from a wall tension and pressures,
 * marine growth, top mass and the small-gap warning.
 */
import { describe, expect, it } from 'vitest';
import { readCase, requestOf, solveCase } from '../../src/app';
import { excitationDefaults } from '../../src/forms/excitation';
import { buildRiserModel } from '../../src/kinds/riser/build';
import { riserTopTension } from '../../src/kinds/riser/tension';
import { RISER_FORM } from '../../src/kinds/riser/form';
import { kindOf } from '../../src/kinds/registry';
import { expectClose } from '../helpers/expect-close';
import { RISER } from './fixtures';
import { massAt } from './helpers';

/** The riser form's defaults (10¾ in × ½ in riser, guides at 10, 20, 30 m, water to 30 m) with changes, in a 1.5 m/s current. */
function riserCase(inputs: Record<string, string>, current = '1.5') {
  const k = kindOf('riser');
  return {
    kind: 'riser' as const,
    unitSystem: 'si' as const,
    inputs: { ...k.form.defaults('si'), outerDiameter: '273.05', ...inputs },
    excitation: { ...excitationDefaults(k.resonance, 'si'), currentSurface: current },
  };
}

function screen(inputs: Record<string, string>, current = '1.5') {
  const r = readCase(riserCase(inputs, current));
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  if (r.engine !== 'beam') throw new Error('a beam member');
  const a = solveCase(requestOf(r));
  if (!a.ok || a.engine === 'plate') throw new Error(JSON.stringify(a));
  if (!a.ok || !a.screening) throw new Error(JSON.stringify(a));
  return { build: r.build, answer: a, screening: a.screening };
}

describe('a riser inside a caisson is screened with the flow inside it', () => {
  it('in open water the 1.5 m/s current puts the first mode inside the lock-in band', () => {
    const { screening } = screen({});
    expect(screening.verdict).toBe('inside-band');
    expect(screening.modes[0].shedding!.flowSpeedMPerS).toBe(1.5);
  });

  for (const caisson of ['34 in', '11.5 in']) {
    it(`inside a ${caisson} caisson with still water inside, the same current cannot excite it`, () => {
      const { screening, build } = screen({ caissonDiameter: caisson });
      expect(build.model.liquid!.flowShielding).toEqual([{ fromM: 0, toM: 30, flowSpeedMPerS: 0, label: 'inside the caisson' }]);
      expect(screening.modes[0].shedding!.flowSpeedMPerS).toBe(0);
      expect(screening.verdict).toBe('clear');
      expect(screening.zones.every((z) => z.shieldedBy === 'inside the caisson' && z.speedMaxMPerS === 0)).toBe(true);
      expect(screening.notes.join(' ')).toMatch(/Shielded inside the caisson .*U = 0 m\/s \(still water\)/);
    });
  }

  it('a flow entered for inside the caisson is the flow the verdict is based on', () => {
    // 11.5 in caisson, 9.5 mm radial gap around a 10¾ in (273.05 mm) riser.
    const { screening, answer } = screen({ caissonDiameter: '11.5 in', caissonInnerFlow: '1.2' });
    const p = screening.modes[0].shedding!;
    expect(p.flowSpeedMPerS).toBe(1.2);
    // V_R = U / (f_n D): classical definition (DNV-RP-C205 §9), worked from the solved frequency.
    const f = answer.member.wet!.modes[0].frequencyHz;
    expectClose(p.reducedVelocity, 1.2 / (f * 0.27305), { rtol: 1e-12, label: 'V_R with the inner flow' });
  });
});

describe('a caisson that ends above the seabed', () => {
  it('confines and shields only from its open bottom up; below it the riser is in open water and the current', () => {
    const { build, screening, answer } = screen({ caissonDiameter: '11.5 in', caissonBottom: '15' });
    expect(build.model.liquid!.boundariesFromM).toBe(15);
    expect(build.model.liquid!.flowShielding).toEqual([{ fromM: 15, toM: 30, flowSpeedMPerS: 0, label: 'inside the caisson' }]);
    expect(build.model.segments.map((s) => [s.fromM, s.toM])).toEqual([
      [0, 15],
      [15, 40],
    ]);
    // Open water below: Ca = 1 (circle, Lamb, classical); confined above: Ca > 1.
    const zones = answer.member.zones.filter((z) => z.submerged);
    expect(zones[0].addedMassCoefficientCa).toBeCloseTo(1, 12);
    expect(zones[1].addedMassCoefficientCa!).toBeGreaterThan(1.5);
    // The mode moves most inside the caisson, in still water; shedding is screened where it moves in the current.
    const p = screening.modes[0].shedding!;
    expect(p.atZM).toBeLessThanOrEqual(15);
    expect(p.flowSpeedMPerS).toBe(1.5);
    expect(p.relativeAmplitude).toBeLessThan(1);
  });
});

describe('effective tension from a wall tension (Sparks)', () => {
  it('matches a hand-worked T_eff = T_wall − p_i·A_i + p_e·A_e at a top 5 m under water', () => {
    // R. Sparks, ASME J. Energy Resources Technology 106 (1984) 46. Hand-worked: D_o = 273.05 mm, t = 12.7 mm,
    // D_i = 247.65 mm, A_i = π/4·0.24765² = 0.0481689 m², A_e = π/4·0.27305² = 0.0585564 m²;
    // p_i = 100 bar → p_i·A_i = 481.689 kN; p_e = 1025 × 9.80665 × 5 = 50259.1 Pa → p_e·A_e = 2.94299 kN;
    // T_eff = 600 − 481.689 + 2.94299 = 121.254 kN.
    const t = riserTopTension({
      ...RISER,
      outerDiameterM: 0.27305,
      wallThicknessM: 0.0127,
      lengthM: 30,
      liquidToM: 35,
      topTensionN: 600e3,
      tensionBasis: 'wall',
      internalPressurePa: 100e5,
    });
    // Hand values to 6 figures: rtol 1e-5.
    expectClose(t.fromWall!.internalTermN, 481689, { rtol: 1e-5, label: 'p_i·A_i' });
    expectClose(t.fromWall!.externalTermN, 2942.99, { rtol: 1e-5, label: 'p_e·A_e' });
    expectClose(t.effectiveN, 121254, { rtol: 1e-5, label: 'T_eff' });
  });

  it('gives the member model the effective tension and says which tension was used', () => {
    const wall = screen({ topTension: '600', tensionBasis: 'wall', internalPressure: '100 bar' });
    // Top (40 m) above the water (30 m): p_e = 0, so T_eff = 600 − 481.689 = 118.311 kN (Sparks, as above).
    expectClose(wall.build.model.tensionN!, 118311, { rtol: 1e-5, label: 'T_eff in the model' });
    expect(wall.build.notes.join(' ')).toMatch(/Tension used: 118 kN \(26\.6 kip\) effective tension .* from the wall tension 600 kN/);
    // The same 600 kN entered as effective tension stiffens the riser more: the wall entry must give a lower f1.
    const eff = screen({ topTension: '600' });
    expect(eff.build.model.tensionN).toBe(600e3);
    expect(wall.answer.member.wet!.modes[0].frequencyHz).toBeLessThan(eff.answer.member.wet!.modes[0].frequencyHz);
  });
});

describe('the internal pressure field', () => {
  it('reads psi and bar alike and names a pressure when something else is typed', () => {
    const form = RISER_FORM;
    const base = { ...form.defaults('si'), topTension: '600', tensionBasis: 'wall' };
    const psi = form.toInput({ ...base, internalPressure: '1450.377 psi' }, 'si');
    // 1 psi = 6894.757 Pa (NIST SP 811): 1450.377 psi = 100.000 bar; rtol 1e-6 for the 7 figures typed.
    if (!psi.ok) throw new Error(JSON.stringify(psi.errors));
    expectClose(psi.input.internalPressurePa!, 100e5, { rtol: 1e-6, label: 'psi → Pa' });
    const wrong = form.toInput({ ...base, internalPressure: '3 m' }, 'si');
    expect(wrong.ok).toBe(false);
    if (!wrong.ok) expect(wrong.errors.internalPressure).toMatch(/a pressure such as 100 bar/);
  });
});

describe('marine growth, top mass and the small-gap warning', () => {
  it('growth on the submerged length adds the hand-worked mass per metre over the coating', () => {
    const b = buildRiserModel({ ...RISER, caisson: undefined, marineGrowth: { thicknessM: 0.05, densityKgPerM3: 1325 } });
    // Coating 3 mm at 1300 kg/m³ on 323.9 mm: 1300·π/4·(0.3299² − 0.3239²) = 4.00525 kg/m;
    // growth 50 mm at 1325 kg/m³ over it: 1325·π/4·(0.4299² − 0.3299²) = 79.0695 kg/m (hand-worked).
    expectClose(massAt(b.model, 10).coating, 4.00525 + 79.0695, { rtol: 1e-5, label: 'coating and growth below water' });
    expectClose(massAt(b.model, 27).coating, 4.00525, { rtol: 1e-5, label: 'coating only above water' });
    expect(b.bands.find((x) => x.id === 'marine-growth')).toEqual({ id: 'marine-growth', label: 'Marine growth', fromM: 0, toM: 22 });
  });

  it('a top mass is a lumped mass at the top end and lowers f1', () => {
    const plain = screen({});
    const heavy = screen({ topMass: '5 t' });
    expect(heavy.build.model.masses).toEqual([{ atM: 40, massKg: 5000 }]);
    expect(heavy.answer.member.dry.modes[0].frequencyHz).toBeLessThan(plain.answer.member.dry.modes[0].frequencyHz);
  });

  it('warns when the smallest gap to the caisson is under 5 % of the riser radius, and not above it', () => {
    // 11.5 in = 292.1 mm caisson around 273.05 mm: gap 9.525 mm concentric; offset 3 mm → 6.525 mm = 4.8 % of 136.5 mm.
    expect(screen({ caissonDiameter: '11.5 in', caissonOffset: '3' }).build.notes.join(' ')).toMatch(/Warning: the smallest gap to the caisson wall is 6\.5[23] mm/);
    // Offset 2 mm → 7.525 mm = 5.5 %: no warning.
    expect(screen({ caissonDiameter: '11.5 in', caissonOffset: '2' }).build.notes.join(' ')).not.toMatch(/Warning/);
  });
});
