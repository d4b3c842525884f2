import { describe, expect, it } from 'vitest';
import { solveMember } from '../../src/physics/beam';
import { buildPileModel, LINEAR_SOIL_STEPS } from '../../src/kinds/pile/build';
import { PILE } from './fixtures';
import { expectClose } from '../helpers/expect-close';
import { expectWellFormed, landmark, massAt } from './helpers';

// Tolerance for hand arithmetic: values below are quoted to 6 figures, so rtol 1e-5.
const HAND = 1e-5;

describe('pile geometry (hand calculation)', () => {
  it('puts z = 0 at a fixity 6 D below the mudline, the water from the mudline to the tide-raised surface, the top above still water', () => {
    const b = buildPileModel(PILE);
    // Fixity 6 × 0.61 = 3.66 m (common practice default); mudline z = 3.66; still water 3.66 + 8 = 11.66;
    // surface 11.66 + 1 = 12.66; top 11.66 + 3 = 14.66 m.
    expectClose(landmark(b, 'mudline'), 3.66, { rtol: 1e-12, label: 'mudline' });
    expectClose(landmark(b, 'still-water'), 11.66, { rtol: 1e-12, label: 'still water' });
    expectClose(landmark(b, 'water-surface'), 12.66, { rtol: 1e-12, label: 'surface' });
    expectClose(b.model.lengthM, 14.66, { rtol: 1e-12, label: 'length' });
    expect(landmark(b, 'fixity')).toBe(0);
    expect(b.model.supports).toEqual([{ atM: 0, kind: 'clamped' }]);
    expectClose(b.model.liquid!.fromM, 3.66, { rtol: 1e-12, label: 'liquid from' });
    expectClose(b.model.liquid!.toM, 12.66, { rtol: 1e-12, label: 'liquid to' });
    expect(b.model.liquid!.densityKgPerM3).toBe(1025);
    expect(b.model.masses).toEqual([{ atM: b.model.lengthM, massKg: 20000, rotaryInertiaKgM2: 5000 }]);
    expectWellFormed(b);
  });

  it('carries steel, flooded water and marine growth per metre where each belongs', () => {
    const { model, bands } = buildPileModel(PILE);
    // Steel: 7850 × π/4 × (0.61² − 0.586²) = 7850 × π/4 × 0.028704 = 176.971 kg/m.
    // Contents (flooded to the surface z = 12.66): 1025 × π/4 × 0.586² = 1025 × π/4 × 0.343396 = 276.445 kg/m.
    // Growth, 50 mm from 2 m above to 40 m below still water, clipped at the mudline (z 3.66 to 13.66):
    // 1325 × π/4 × (0.71² − 0.61²) = 1325 × π/4 × 0.132 = 137.366 kg/m.
    const expected: [number, number, number, number][] = [
      [2, 176.971, 276.445, 0], // below the mudline: steel + water inside
      [8, 176.971, 276.445, 137.366], // in water with growth
      [13, 176.971, 0, 137.366], // above the surface, growth still (splash zone)
      [14.2, 176.971, 0, 0], // near the top, bare
    ];
    for (const [z, steel, contents, growth] of expected) {
      const m = massAt(model, z);
      expectClose(m.structure, steel, { rtol: HAND, label: `steel at z = ${z}` });
      expectClose(m.contents, contents, { rtol: HAND, atol: 1e-9, label: `contents at z = ${z}` });
      expectClose(m.coating, growth, { rtol: HAND, atol: 1e-9, label: `growth at z = ${z}` });
    }
    const growthBand = bands.find((x) => x.id === 'marine-growth')!;
    expectClose(growthBand.fromM, 3.66, { rtol: 1e-12, label: 'growth from' });
    expectClose(growthBand.toM, 13.66, { rtol: 1e-12, label: 'growth to' });
  });

  it('a sealed pile carries no contents anywhere', () => {
    const { model } = buildPileModel({ ...PILE, flooded: false });
    for (const s of model.segments) expect(s.contentsDensityKgPerM3 ?? 0).toBe(0);
  });

  it('the tide offset moves the water and the flooded level, never the pile (invariance)', () => {
    for (const offset of [-2, -0.5, 0, 0.7, 2.5]) {
      const b = buildPileModel({ ...PILE, waterLevelOffsetM: offset });
      expectClose(b.model.lengthM, 14.66, { rtol: 1e-12, label: `length, offset ${offset}` });
      expectClose(b.model.liquid!.toM, 11.66 + offset, { rtol: 1e-12, label: `surface, offset ${offset}` });
      expect(massAt(b.model, 11.66 + offset - 0.01).contents).toBeGreaterThan(0);
      expect(massAt(b.model, 11.66 + offset + 0.01).contents).toBe(0);
      expectWellFormed(b);
    }
  });

  it('an overtopped pile is wet to its top, and water below the mudline leaves it dry', () => {
    const over = buildPileModel({ ...PILE, topAboveStillWaterM: -1, waterLevelOffsetM: 0 });
    expectClose(over.model.liquid!.toM, over.model.lengthM, { rtol: 1e-12, label: 'wet to the top' });
    expect(landmark(over, 'still-water')).toBeGreaterThan(over.model.lengthM);
    const dry = buildPileModel({ ...PILE, waterLevelOffsetM: -9 });
    expect(dry.model.liquid).toBeUndefined();
    expectWellFormed(over);
    expectWellFormed(dry);
  });

  it('soil springs put z = 0 at the toe with constant or depth-stepped subgrade moduli and no support', () => {
    const c = buildPileModel({ ...PILE, foundation: { kind: 'soil-springs', embeddedLengthM: 12, modulusNPerM2: 5e6 } });
    expect(landmark(c, 'toe')).toBe(0);
    expect(landmark(c, 'mudline')).toBe(12);
    expect(c.model.supports).toEqual([]);
    expect(c.model.soilSprings).toEqual([{ fromM: 0, toM: 12, modulusNPerM2: 5e6 }]);
    expectWellFormed(c);

    const nh = 4.4e6;
    const lin = buildPileModel({ ...PILE, foundation: { kind: 'soil-springs-linear', embeddedLengthM: 12, modulusGradientNPerM3: nh } });
    const steps = lin.model.soilSprings!;
    expect(steps.length).toBe(LINEAR_SOIL_STEPS);
    // Total lateral spring over the embedded length, ∫ n_h·d dd from 0 to 12 = n_h × 12²/2 = 72 n_h (exact for
    // the step means). Deepest step, 10.8 to 12 m below the mudline: n_h × 11.4 m.
    const total = steps.reduce((s, x) => s + x.modulusNPerM2 * (x.toM - x.fromM), 0);
    expectClose(total, 72 * nh, { rtol: 1e-12, label: 'total soil spring' });
    expectClose(steps[0].modulusNPerM2, 11.4 * nh, { rtol: 1e-12, label: 'deepest step' });
    expectWellFormed(lin);
  });

  it('an explicit fixity depth replaces the 6 D default', () => {
    const b = buildPileModel({ ...PILE, foundation: { kind: 'fixity', depthBelowMudlineM: 2.5 } });
    expect(landmark(b, 'mudline')).toBe(2.5);
    expectClose(b.model.lengthM, 2.5 + 8 + 3, { rtol: 1e-12, label: 'length' });
  });

  it('a dry sealed pile without mass solves to the clamped–free beam frequency (cross-check through the beam engine)', () => {
    // Water depth 0: L = 6 × 0.61 + 10 = 13.66 m. f1 = λ1²/(2π L²) √(EI/m), λ1 = 1.875104
    // (Thomson, Theory of Vibration, Table 9.5-1). EI = E π/64 (0.61⁴ − 0.586⁴); m = 176.971 kg/m.
    const b = buildPileModel({ ...PILE, waterDepthM: 0, waterLevelOffsetM: 0, topAboveStillWaterM: 10, flooded: false, marineGrowth: undefined, topMassKg: 0, topRotaryInertiaKgM2: 0 });
    expect(b.model.liquid).toBeUndefined();
    const out = solveMember({ ...b.model, modes: 1 });
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    const ei = (210e9 * Math.PI * (0.61 ** 4 - 0.586 ** 4)) / 64;
    const m = 7850 * (Math.PI / 4) * (0.61 ** 2 - 0.586 ** 2);
    const f1 = (1.875104 ** 2 / (2 * Math.PI * 13.66 ** 2)) * Math.sqrt(ei / m);
    // The engine converges to 0.05 % by default; λ1 is quoted to 7 figures: rtol 1e-3.
    expectClose(out.result.dry.frequenciesHz[0], f1, { rtol: 1e-3, label: 'f1 dry' });
  });
});
