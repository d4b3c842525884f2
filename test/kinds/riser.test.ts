import { describe, expect, it } from 'vitest';
import { solveMember } from '../../src/physics/beam';
import { buildRiserModel } from '../../src/kinds/riser/build';
import { RISER } from './fixtures';
import { expectClose } from '../helpers/expect-close';
import { expectWellFormed, landmark, massAt } from './helpers';

describe('riser model (hand calculation)', () => {
  it('pins the bottom and every guide, leaves a free top unsupported, and wets the range given', () => {
    const b = buildRiserModel(RISER);
    expect(b.model.lengthM).toBe(30);
    expect(b.model.supports).toEqual([
      { atM: 0, kind: 'pinned' },
      { atM: 5, kind: 'pinned' },
      { atM: 15, kind: 'pinned' },
      { atM: 25, kind: 'pinned' },
    ]);
    expect(b.model.liquid).toMatchObject({ densityKgPerM3: 1025, fromM: 0, toM: 22 });
    expect(b.landmarks.filter((l) => l.id === 'guide').map((l) => [l.label, l.zM])).toEqual([
      ['Guide 1', 5],
      ['Guide 2', 15],
      ['Guide 3', 25],
    ]);
    expect(landmark(b, 'water-surface')).toBe(22);
    // Default: tension given at the top (here none) falls by the weight below (effective tension).
    expect(b.model.tensionN).toBe(0);
    expect(b.model.tensionVariesWithWeight).toBe(true);
    expectWellFormed(b);
  });

  it('carries steel, contents and coating per metre over the whole length', () => {
    const { model } = buildRiserModel(RISER);
    // Steel: 7850 × π/4 × (0.3239² − 0.2985²) = 7850 × π/4 × (0.104911 − 0.0891023) = 97.4682 kg/m.
    // Oil: 850 × π/4 × 0.2985² = 59.4836 kg/m. Coating: 1300 × π/4 × (0.3299² − 0.3239²) = 4.00525 kg/m.
    for (const z of [1, 20, 29]) {
      const m = massAt(model, z);
      // Hand values to 6 figures: rtol 1e-5.
      expectClose(m.structure, 97.4682, { rtol: 1e-5, label: `steel at ${z}` });
      expectClose(m.contents, 59.4836, { rtol: 1e-5, label: `oil at ${z}` });
      expectClose(m.coating, 4.00525, { rtol: 1e-5, label: `coating at ${z}` });
    }
  });

  it('places the caisson as an enclosure offset from the riser in the section convention', () => {
    const b = buildRiserModel(RISER);
    const [enc] = b.model.liquid!.boundaries!;
    expect(enc).toMatchObject({ kind: 'enclosure', shape: 'circle', diameterM: 0.6 });
    // Offset 50 mm at 90° from the motion (x): the caisson centre is at −0.05 (cos 90°, sin 90°) = (0, −0.05).
    const c = (enc as unknown as { centerM: [number, number] }).centerM;
    expectClose(c[0], 0, { atol: 1e-15, label: 'centre x' });
    expectClose(c[1], -0.05, { rtol: 1e-12, label: 'centre y' });
    expect(b.confinement).toEqual({ kind: 'surrounding-tube', innerDiameterM: 0.6, offsetM: 0.05, offsetAngleDeg: 90 });
  });

  it('the order in which guides are typed does not matter (invariance)', () => {
    const a = buildRiserModel(RISER);
    const b = buildRiserModel({ ...RISER, guideElevationsM: [15, 25, 5] });
    expect(b.model).toEqual(a.model);
  });

  it('end conditions map to supports: clamped, pinned, sliding (guided) and free', () => {
    const b = buildRiserModel({ ...RISER, bottom: 'clamped', top: 'sliding', guideElevationsM: [] });
    expect(b.model.supports).toEqual([
      { atM: 0, kind: 'clamped' },
      { atM: 30, kind: 'guided' },
    ]);
    const free = buildRiserModel({ ...RISER, bottom: 'free', top: 'free', guideElevationsM: [10, 20] });
    expect(free.model.supports.map((s) => s.atM)).toEqual([10, 20]);
  });

  it('constant top tension is passed as is when weight is not to change it', () => {
    const b = buildRiserModel({ ...RISER, topTensionN: 2e5, tensionVariesWithWeight: false });
    expect(b.model.tensionN).toBe(2e5);
    expect(b.model.tensionVariesWithWeight).toBeUndefined();
  });

  it('a concentric caisson gives the added mass of a cylinder in a rigid annulus (cross-check through the section solver)', () => {
    // Fritz, ASME J. Eng. Industry 94 (1972) 167: m_a = ρ π R1² (R2² + R1²)/(R2² − R1²); R1 = 0.3299/2
    // (outer diameter with coating), R2 = 0.3 m, ρ = 1025: m_a = 163.545 kg/m (hand calculation), against
    // ρ π R1² = 87.615 kg/m in open water.
    const b = buildRiserModel({ ...RISER, caisson: { innerDiameterM: 0.6 } });
    const out = solveMember({ ...b.model, modes: 1 });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    const wet = out.result.zones.find((z) => z.submerged)!;
    // Boundary-element solver at its default resolution; its own tests hold the tight check: rtol 1e-2.
    expectClose(wet.addedKgPerM, 163.545, { rtol: 1e-2, label: 'added mass in the caisson' });
  });
});
