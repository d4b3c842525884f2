import { describe, expect, it } from 'vitest';
import { sectionAt, solveMember } from '../../src/physics/beam';
import { buildBaffleModel } from '../../src/kinds/baffle/build';
import { buildStemModel } from '../../src/kinds/stem/build';
import { BAFFLE, STEM } from './fixtures';
import { expectClose } from '../helpers/expect-close';
import { expectWellFormed, landmark, massAt } from './helpers';

describe('baffle model (hand calculation)', () => {
  it('welded is clamped, bolted is pinned, and the liquid reaches the level above the lower end', () => {
    const b = buildBaffleModel(BAFFLE);
    expect(b.model.supports).toEqual([
      { atM: 0, kind: 'clamped' },
      { atM: 1.5, kind: 'pinned' },
    ]);
    // Lower end 0.5 m above the floor, level 1.4 m: wet from z = 0 to 1.4 − 0.5 = 0.9 m; floor at z = −0.5.
    expectClose(b.model.liquid!.toM, 0.9, { rtol: 1e-12, label: 'wet to' });
    expect(landmark(b, 'tank-floor')).toBe(-0.5);
    expectClose(landmark(b, 'liquid-level'), 0.9, { rtol: 1e-12, label: 'level' });
    expect(b.model.liquid!.perforationRatio).toBe(0.2);
    expectWellFormed(b);
  });

  it('puts the parallel wall at x = −(gap + t/2) facing the plate, in the section convention', () => {
    const b = buildBaffleModel(BAFFLE);
    // Gap 40 mm from the plate face, plate 10 mm thick centred at x = 0: the wall is the line x = −0.045.
    expect(b.model.liquid!.boundaries).toEqual([{ kind: 'wall', pointM: [-0.045, 0], normal: [1, 0] }]);
    expect(b.confinement).toEqual({ kind: 'parallel-wall', gapM: 0.04 });
  });

  it('a plate strip of 300 × 10 mm steel has 23.55 kg/m and rigidity D·w = 5769.23 N·m²', () => {
    const { model } = buildBaffleModel(BAFFLE);
    // Mass 7850 × 0.3 × 0.01 = 23.55 kg/m. D = E t³/(12(1 − ν²)) = 210e9 × 1e-6 / 10.92 = 19230.8 N·m per metre
    // width (classical plate theory); × 0.3 m = 5769.23 N·m².
    expectClose(massAt(model, 0.7).structure, 23.55, { rtol: 1e-12, label: 'mass per metre' });
    expectClose(sectionAt(model.segments[0], 0.5).eiNm2, 5769.23, { rtol: 1e-6, label: 'EI of the strip' });
  });

  it('a level above the span wets all of it; a level below the lower end leaves it dry', () => {
    expect(buildBaffleModel({ ...BAFFLE, liquidLevelAboveFloorM: 3 }).model.liquid!.toM).toBe(1.5);
    const dry = buildBaffleModel({ ...BAFFLE, liquidLevelAboveFloorM: 0.3 });
    expect(dry.model.liquid).toBeUndefined();
    expect(dry.bands).toEqual([]);
    expectWellFormed(dry);
  });

  it('bolted at both ends is pinned–pinned; welded and free is a cantilever', () => {
    expect(buildBaffleModel({ ...BAFFLE, lowerEnd: 'bolted' }).model.supports.map((s) => s.kind)).toEqual(['pinned', 'pinned']);
    expect(buildBaffleModel({ ...BAFFLE, upperEnd: 'free' }).model.supports).toEqual([{ atM: 0, kind: 'clamped' }]);
  });
});

describe('sensor stem model (hand calculation)', () => {
  it('tapers the tube from root to tip around a constant bore', () => {
    const { model } = buildStemModel(STEM);
    expect(model.segments[0].section).toEqual({ shape: 'tube', outerDiameterM: 0.028, wallThicknessM: 0.0105 });
    expect(model.segments[0].endSection).toEqual({ shape: 'tube', outerDiameterM: 0.022, wallThicknessM: 0.0075 });
    // 8000 × π/4 × (D² − 0.007²): root D = 28 mm → 4.61814 kg/m; mid D = 25 mm → 3.61911; tip 22 mm → 2.73319.
    expectClose(massAt(model, 0).structure, 4.61814, { rtol: 1e-5, label: 'root' });
    expectClose(massAt(model, 0.125).structure, 3.61911, { rtol: 1e-5, label: 'mid (bore stays 7 mm)' });
    expectClose(massAt(model, 0.25).structure, 2.73319, { rtol: 1e-5, label: 'tip' });
  });

  it('holds a flexible root in place with a rotational spring, puts the tip mass at the tip and wets the whole length', () => {
    const b = buildStemModel(STEM);
    expect(b.model.supports).toEqual([
      { atM: 0, kind: 'pinned' },
      { atM: 0, kind: 'spring', rotationalStiffnessNmPerRad: 5e4 },
    ]);
    expect(b.model.masses).toEqual([{ atM: 0.25, massKg: 0.1 }]);
    expect(b.model.liquid).toEqual({
      densityKgPerM3: 1000,
      fromM: 0,
      toM: 0.25,
      boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 0.05 }],
    });
    expectWellFormed(b);
  });

  it('a stubby stem gets the Timoshenko beam automatically; a slender one, or an explicit choice, does not', () => {
    // Length / largest diameter = 0.25 / 0.028 = 8.9 < 10 (common-practice threshold, docs/sources.md §S13): shear included.
    const stubby = buildStemModel(STEM);
    expect(stubby.model.beamTheory).toBe('timoshenko');
    expect(stubby.notes.some((n) => n.includes('Timoshenko'))).toBe(true);
    // 0.3 / 0.028 = 10.7: Euler–Bernoulli, the engine's default (field left out).
    expect(buildStemModel({ ...STEM, insertionLengthM: 0.3 }).model.beamTheory).toBeUndefined();
    expect(buildStemModel({ ...STEM, beamTheory: 'euler-bernoulli' }).model.beamTheory).toBeUndefined();
    expect(buildStemModel({ ...STEM, insertionLengthM: 0.3, beamTheory: 'timoshenko' }).model.beamTheory).toBe('timoshenko');
  });

  it('a solid straight stem is one rod; a rigid root is clamped', () => {
    const { model } = buildStemModel({ ...STEM, boreDiameterM: 0, tipDiameterM: 0.028, rootSupport: { kind: 'rigid' } });
    expect(model.segments[0].section).toEqual({ shape: 'rod', diameterM: 0.028 });
    expect(model.segments[0].endSection).toBeUndefined();
    expect(model.supports).toEqual([{ atM: 0, kind: 'clamped' }]);
  });

  it('a straight stem with a tip mass equal to its own mass has λ² = 1.557298 (cross-check through the beam engine)', () => {
    // Published: Mathematical Problems in Engineering 2017, article 1568019, Table 1 (μ = M/(mL) = 1).
    // Solid 20 mm rod, L = 0.25 m: m = 8000 × π/4 × 0.02² = 2.51327 kg/m; M = m L = 0.628319 kg.
    const m = 8000 * (Math.PI / 4) * 0.02 ** 2;
    const b = buildStemModel({ ...STEM, rootDiameterM: 0.02, tipDiameterM: 0.02, boreDiameterM: 0, tipMassKg: m * 0.25, surroundingInnerDiameterM: undefined, rootSupport: { kind: 'rigid' } });
    const out = solveMember({ ...b.model, modes: 1 });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    const ei = (193e9 * Math.PI * 0.02 ** 4) / 64;
    const f1 = (1.557298 / (2 * Math.PI * 0.25 ** 2)) * Math.sqrt(ei / m);
    // Engine converged to 0.05 %: rtol 1e-3.
    expectClose(out.result.dry.frequenciesHz[0], f1, { rtol: 1e-3, label: 'f1 with tip mass' });
    // Wet in open water, no tip mass: uniform added mass ρπD²/4 on the whole length keeps the mode shape, so
    // f_wet/f_dry = √(m / (m + ρπD²/4)) (classical). ρπD²/4 = 1000 × π/4 × 0.02² = 0.314159 kg/m.
    const bare = buildStemModel({ ...STEM, rootDiameterM: 0.02, tipDiameterM: 0.02, boreDiameterM: 0, tipMassKg: 0, surroundingInnerDiameterM: undefined, rootSupport: { kind: 'rigid' } });
    const wet = solveMember({ ...bare.model, modes: 1 });
    expect(wet.ok).toBe(true);
    if (!wet.ok) return;
    const ratio = Math.sqrt(m / (m + 1000 * (Math.PI / 4) * 0.02 ** 2));
    expectClose(wet.result.wetToDryRatio![0], ratio, { rtol: 1e-3, label: 'wet/dry ratio' });
  });
});
