import { describe, it, expect } from 'vitest';
import { solveMember } from '../../../src/physics/beam';
import { screeningInputFor, effectiveMassKgPerM, submergedZones } from '../../../src/physics/excitation/from-member';
import { screenResonance } from '../../../src/physics/excitation';
import { uniformMember, uniformProps } from '../beam/fixtures';
import { expectClose } from '../../helpers/expect-close';

function solved(model: Parameters<typeof solveMember>[0]) {
  const out = solveMember(model);
  if (!out.ok) throw new Error(out.message);
  return out.result;
}

describe('screening a solved member', () => {
  it('the effective mass of a uniform, fully submerged member is its mass per metre plus ρπD²/4, whatever the mode', () => {
    // m_e = ∫mφ²/∫φ² reduces to m when m is uniform (definition, DNV-RP-C205 §9); added mass ρπD²/4 (Lamb, Ca = 1).
    const model = uniformMember(12, [{ atM: 0, kind: 'clamped' }], { liquid: { densityKgPerM3: 1025, fromM: 0, toM: 12 } });
    const r = solved(model);
    const { m } = uniformProps();
    const expected = m + (1025 * Math.PI * 0.5 ** 2) / 4;
    for (const mode of r.wet!.modes) {
      expectClose(effectiveMassKgPerM(r.zones, mode.shape.zM, mode.shape.displacement), expected, {
        rtol: 1e-12, // exact for piecewise-constant mass: only rounding
        label: `m_e of mode ${mode.mode}`,
      });
    }
  });

  it('the effective mass of a partly submerged member lies between its dry and fully wet mass per metre', () => {
    const model = uniformMember(12, [{ atM: 0, kind: 'clamped' }], { liquid: { densityKgPerM3: 1025, fromM: 0, toM: 6 } });
    const r = solved(model);
    const { m } = uniformProps();
    const wet = m + (1025 * Math.PI * 0.5 ** 2) / 4;
    const me = effectiveMassKgPerM(r.zones, r.wet!.modes[0].shape.zM, r.wet!.modes[0].shape.displacement);
    expect(me).toBeGreaterThan(m);
    expect(me).toBeLessThan(wet);
  });

  it('the flow sees the outer diameter including marine growth (NORSOK N-003 §6.2.4.2, from memory)', () => {
    const model = uniformMember(
      12,
      [{ atM: 0, kind: 'clamped' }],
      { liquid: { densityKgPerM3: 1025, fromM: 0, toM: 8 } },
      { coating: { thicknessM: 0.05, densityKgPerM3: 1325 } },
    );
    const r = solved(model);
    const zones = submergedZones(model, r.zones);
    expect(zones).toHaveLength(1);
    expect(zones[0]).toMatchObject({ fromM: 0, toM: 8 });
    expectClose(zones[0].section.kind === 'circle' ? zones[0].section.outerDiameterM : NaN, 0.6, {
      rtol: 1e-12, // 0.5 m + 2 × 0.05 m, exact arithmetic
      label: 'outer diameter with growth',
    });
  });

  it('a dry-only member has no submerged zones, so no shedding verdict can be worse than clear', () => {
    const model = uniformMember(12, [{ atM: 0, kind: 'clamped' }]);
    const r = solved(model);
    const input = screeningInputFor(model, r, { flowSpeedMPerS: 2 });
    expect(input.zones).toEqual([]);
    expect(screenResonance(input).verdict).toBe('clear');
  });

  it('wet and dry frequencies travel together mode by mode', () => {
    const model = uniformMember(12, [{ atM: 0, kind: 'clamped' }], { liquid: { densityKgPerM3: 1025, fromM: 0, toM: 12 } });
    const r = solved(model);
    const input = screeningInputFor(model, r, { flowSpeedMPerS: 0.5 });
    input.modes.forEach((m, i) => {
      expect(m.wetFrequencyHz).toBe(r.wet!.frequenciesHz[i]);
      expect(m.dryFrequencyHz).toBe(r.dry.frequenciesHz[i]);
    });
  });
});
