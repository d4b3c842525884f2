import { describe, expect, it } from 'vitest';
import { parseMemberModel, solveMember } from '../../../src/physics/beam';
import pile from '../../../examples/member-fender-pile-port-halloran.json';
import riser from '../../../examples/member-riser-skerry-alpha.json';
import { memberBand } from '../../../src/physics/uncertain/band';
import { FLAT_RTOL } from '../../../src/physics/uncertain/monotone';
import { seededUniform01 } from '../../../src/physics/linalg/seeded';
import { expectClose } from '../../helpers/expect-close';
import { beamFrequency, uniformMember, uniformProps, PIPE } from '../beam/fixtures';
import { PILE_RANGES, tipMassLambdas } from './fixtures';

const L = 10;
const { ei, m } = uniformProps();

function bandOf(...args: Parameters<typeof memberBand>) {
  const out = memberBand(...args);
  if (!out.ok) throw new Error(out.message);
  return out.band;
}

describe('frequency band over ranged inputs', () => {
  it('a fully submerged uniform cantilever with a range on liquid density scales by √(m/(m+m_a)) at both ends', () => {
    // No Ca override exists in the member model; the added mass of an open circle is m_a = Ca ρ π D²/4 with
    // Ca = 1 (H. Lamb, Hydrodynamics, classical), so ranging ρ ranges m_a exactly as ranging Ca would.
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 3, liquid: { densityKgPerM3: 1025, fromM: 0, toM: L } });
    const band = bandOf(model, [{ path: 'liquid.densityKgPerM3', low: 800, high: 2000 }]);
    const d = PIPE.section.shape === 'tube' ? PIPE.section.outerDiameterM : NaN;
    const area = (Math.PI * d * d) / 4;
    for (let j = 0; j < 3; j++) {
      const fDry = band.dry.likelyHz[j];
      // Mass-ratio rule f_wet/f_dry = √(m/(m+m_a)) for a uniform added mass (classical). Same mesh, same
      // shapes: exact up to rounding.
      expectClose(band.wet!.lowHz[j], fDry * Math.sqrt(m / (m + 2000 * area)), { rtol: 1e-6, label: `wet low, mode ${j + 1}` });
      expectClose(band.wet!.highHz[j], fDry * Math.sqrt(m / (m + 800 * area)), { rtol: 1e-6, label: `wet high, mode ${j + 1}` });
      // Density does not touch the dry member.
      expect(band.dry.lowHz[j]).toBe(band.dry.highHz[j]);
      expect(band.wet!.modes[j].method).toBe('corners');
    }
    // Cantilever λ1 = 1.875104 (R.D. Blevins, Formulas for Natural Frequency and Mode Shape, Table 8-1);
    // 1e-5: the converged mesh is far better than that.
    expectClose(band.dry.likelyHz[0], beamFrequency(1.875104, L, ei, m), { rtol: 1e-5, label: 'dry cantilever f1' });
    expect(band.method).toBe('corners');
  });

  it('a cantilever with a tip-mass range has band ends at the tip-mass frequency equation for the two masses', () => {
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 3, masses: [{ atM: L, massKg: m * L }] });
    const band = bandOf(model, [{ path: 'masses.0.massKg', low: 0.2 * m * L, high: 2 * m * L }]);
    // Cross-check of the published equation (Blevins Table 8-8) solved here by scan and bisection.
    const light = tipMassLambdas(0.2, 3);
    const heavy = tipMassLambdas(2, 3);
    for (let j = 0; j < 3; j++) {
      // 1e-4: the mesh tolerance of 0.05 % on changes between doublings leaves errors well below this.
      expectClose(band.dry.highHz[j], beamFrequency(light[j], L, ei, m), { rtol: 1e-4, label: `high end (μ = 0.2), mode ${j + 1}` });
      expectClose(band.dry.lowHz[j], beamFrequency(heavy[j], L, ei, m), { rtol: 1e-4, label: `low end (μ = 2), mode ${j + 1}` });
      expect(band.dry.modes[j].method).toBe('corners');
    }
    expect(band.wet).toBeNull();
  });

  it('a pinned support moved across the mid-span node is caught as non-monotone and searched; the band holds 200 random samples', () => {
    // Pinned–pinned beam with a third pin moving over [3, 7] m: the lowest frequency peaks with the pin at
    // mid-span, the node of the second pinned–pinned mode, where it equals that mode: λ = 2π
    // (R.D. Blevins, Formulas for Natural Frequency and Mode Shape, Table 8-1, pinned–pinned).
    const model = uniformMember(
      L,
      [{ atM: 0, kind: 'pinned' }, { atM: 4, kind: 'pinned' }, { atM: L, kind: 'pinned' }],
      { modes: 2, mesh: { initialElements: 60, refine: false } },
    );
    const band = bandOf(model, [{ path: 'supports.1.atM', low: 3, high: 7 }]);
    expect(band.dry.modes[0].method).toBe('sampled');
    expect(band.dry.modes[0].reason).toContain('supports.1.atM');
    // 1e-6: the search's line tolerance is 1e-6 of the range at a smooth peak; the 60-element mesh error is below it.
    expectClose(band.dry.highHz[0], beamFrequency(2 * Math.PI, L, ei, m), { rtol: 1e-6, label: 'peak of f1 with the pin at mid-span' });
    expectClose(band.dry.modes[0].highAt[0], 5, { rtol: 1e-3, label: 'pin position of the peak' });
    // The corners alone (pin at 3 or 7 m) would miss the peak by far more than 1 %.
    const corner = solveMember({ ...model, supports: [model.supports[0], { atM: 3, kind: 'pinned' }, model.supports[2]] });
    if (!corner.ok) throw new Error(corner.message);
    expect(corner.result.dry.frequenciesHz[0]).toBeLessThan(0.99 * band.dry.highHz[0]);

    const rnd = seededUniform01(2026);
    for (let s = 0; s < 200; s++) {
      const at = 3 + 4 * rnd();
      const out = solveMember({ ...model, supports: [model.supports[0], { atM: at, kind: 'pinned' }, model.supports[2]] });
      if (!out.ok) throw new Error(out.message);
      out.result.dry.frequenciesHz.forEach((f, j) => {
        // Same mesh settings as the band's solves, so the containment is exact up to rounding (1e-12).
        expect(f, `sample ${s} at ${at} m, mode ${j + 1}`).toBeGreaterThanOrEqual(band.dry.lowHz[j] * (1 - 1e-12));
        expect(f, `sample ${s} at ${at} m, mode ${j + 1}`).toBeLessThanOrEqual(band.dry.highHz[j] * (1 + 1e-12));
      });
    }
  });
});

describe('band with many ranged inputs', () => {
  it('solving only the corners the axis directions point to gives the same band as every corner', () => {
    // Six inputs of the Port Halloran fender pile, all monotone; cross-check of the two corner routes.
    const model = parseMemberModel(pile);
    const ranges = PILE_RANGES;
    const directed = bandOf(model, ranges);
    const every = bandOf(model, ranges, { allCorners: true });
    expect(directed.method).toBe('corners');
    expect(directed.solves).toBeLessThan(every.solves);
    for (const s of ['dry', 'wet'] as const) {
      directed[s]!.lowHz.forEach((lo, j) => {
        // FLAT_RTOL: an input that moves a mode by less than that (a dry mode and the water level, through the
        // mesh alone) counts as flat, and either of its ends may then be the one solved.
        expectClose(lo, every[s]!.lowHz[j], { rtol: FLAT_RTOL, label: `${s} low, mode ${j + 1}` });
        expectClose(directed[s]!.highHz[j], every[s]!.highHz[j], { rtol: FLAT_RTOL, label: `${s} high, mode ${j + 1}` });
      });
    }
  });

  it('a ranged liquid density on a confined section reuses one section solve scaled by density, exactly', () => {
    // Potential-flow added mass is ρ times a geometric integral (H. Lamb, Hydrodynamics, classical).
    const model = parseMemberModel(riser);
    const direct = solveMember({ ...model, liquid: { ...model.liquid!, densityKgPerM3: 1010 } });
    const band = bandOf(model, [{ path: 'liquid.densityKgPerM3', low: 1010, high: 1030 }]);
    if (!direct.ok) throw new Error(direct.message);
    // 1e-6: the band's fixed mesh against the adaptive one at 72 elements (both converged far below this).
    expectClose(band.wet!.highHz[0], direct.result.wet!.frequenciesHz[0], { rtol: 1e-6, label: 'wet f1 at 1010 kg/m³' });
  });
});

describe('band limits and failures', () => {
  it('a compression range that buckles the member is a typed failure naming the setting', () => {
    // Euler load of a cantilever π²EI/(4L²) (classical); the range runs to twice it in compression.
    const pcr = (Math.PI ** 2 * ei) / (4 * L * L);
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 2, tensionN: 0 });
    const out = memberBand(model, [{ path: 'tensionN', low: -2 * pcr, high: 0 }]);
    expect(out.ok).toBe(false);
    if (!out.ok) {
      expect(out.reason).toBe('buckles');
      expect(out.message).toContain('at tensionN = ');
    }
  });

  it('a sampled search stops at the solve budget and says so', () => {
    const model = uniformMember(L, [{ atM: 0, kind: 'pinned' }, { atM: 4, kind: 'pinned' }, { atM: L, kind: 'pinned' }], { modes: 2 });
    const band = bandOf(model, [{ path: 'supports.1.atM', low: 3, high: 7 }], { maxSolves: 20 });
    expect(band.solves).toBe(20);
    expect(band.budgetExhausted).toBe(true);
    expect(band.notes.join(' ')).toContain('budget of 20 solves');
    expect(() => memberBand(model, [{ path: 'supports.1.atM', low: 3, high: 7 }], { maxSolves: 3 })).toThrow('maxSolves must be at least 7');
  });

  it('sensitivity entries equal the member solved with one input at each end, largest swing first', () => {
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], {
      modes: 2,
      masses: [{ atM: L, massKg: 500 }],
      liquid: { densityKgPerM3: 1025, fromM: 0, toM: 6 },
    });
    const band = bandOf(model, [
      { path: 'liquid.toM', low: 4, high: 8 },
      { path: 'masses.0.massKg', low: 0, high: 3000 },
    ]);
    expect(band.sensitivity.map((e) => e.path)).toEqual(['masses.0.massKg', 'liquid.toM']);
    const direct = solveMember({ ...model, masses: [{ atM: L, massKg: 3000 }] });
    if (!direct.ok) throw new Error(direct.message);
    // Cross-check by a direct adaptive solve; 1e-6: the band's fixed mesh is the likely answer's converged one.
    expectClose(band.sensitivity[0].atHighHz, direct.result.wet!.frequenciesHz[0], { rtol: 1e-6, label: 'f1 with 3000 kg at the tip' });
    expect(band.sensitivity[0].direction).toBe('down');
  });
});
