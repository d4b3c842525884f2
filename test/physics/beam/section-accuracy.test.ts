import { describe, expect, it } from 'vitest';
import { solveMember, type MemberModel, type SectionSolver } from '../../../src/physics/beam';
import { solveSection } from '../../../src/physics/section/index';
import { expectClose } from '../../helpers/expect-close';

/** A 0.3 m × 10 mm plate strip, clamped–pinned, fully in water, moving normal to itself towards a wall `gapM` away. */
function plateByWall(gapM: number): MemberModel {
  return {
    lengthM: 2.4,
    segments: [{ fromM: 0, toM: 2.4, section: { shape: 'plate-strip', widthM: 0.3, thicknessM: 0.01 }, youngsModulusPa: 193e9, densityKgPerM3: 8000 }],
    liquid: { densityKgPerM3: 1000, fromM: 0, toM: 2.4, boundaries: [{ kind: 'wall', pointM: [0.005 + gapM, 0], normal: [-1, 0] }] },
    supports: [
      { atM: 0, kind: 'clamped' },
      { atM: 2.4, kind: 'pinned' },
    ],
    modes: 3,
  };
}

/** The section solver at 512 panels per body, Richardson-extrapolated: the converged reference (cross-check). */
const converged: SectionSolver = (input) => {
  const out = solveSection(input, { panelsPerBody: 512 });
  if (!out.ok) return out;
  const m = out.result.addedMass.map((row) => row.slice());
  m[0][0] = out.result.errorEstimates[0].extrapolated;
  return { ok: true, result: { addedMass: m } };
};

describe('the member path resolves confined added mass to a stated accuracy', () => {
  it('a plate 2 mm from a wall gets its converged added mass, and the wet frequency band contains the converged frequency', () => {
    const out = solveMember(plateByWall(0.002));
    const ref = solveMember(plateByWall(0.002), { sectionSolver: converged });
    if (!out.ok || !ref.ok) throw new Error('solve failed');
    const ca = out.result.zones[0].addedMassCoefficientCa!;
    const caRef = ref.result.zones[0].addedMassCoefficientCa!;
    // 1 %: the member path stops at 256 panels per body, whose own estimate here is about 0.8 % (cross-check at 512 panels).
    expectClose(ca, caRef, { rtol: 0.01, label: 'Ca of the plate 2 mm from the wall' });
    const band = out.result.addedMass!.wetFrequencyBand!;
    expect(band).toBeDefined();
    ref.result.wet!.frequenciesHz.forEach((f, i) => {
      expect(f, `mode ${i + 1} above the band's low end`).toBeGreaterThanOrEqual(band.lowHz[i]);
      expect(f, `mode ${i + 1} below the band's high end`).toBeLessThanOrEqual(band.highHz[i]);
    });
  });

  it('a plate 50 mm from the wall resolves to the member path tolerance of 0.5 % and needs no warning', () => {
    const out = solveMember(plateByWall(0.05));
    if (!out.ok) throw new Error(out.message);
    expect(out.result.addedMass!.sectionRelativeError!).toBeLessThanOrEqual(5e-3);
    expect(out.result.warnings.join(' ')).not.toMatch(/section solver's added mass carries/);
  });

  it('an added-mass error that moves the frequencies by more than 1 % is warned about', () => {
    // A stand-in solver reporting a 10 % error (the frequency band is then a few per cent wide).
    const loose: SectionSolver = (input) => {
      const out = converged(input);
      return out.ok ? { ok: true, result: { ...out.result, swayRelativeError: 0.1 } } : out;
    };
    const out = solveMember(plateByWall(0.05), { sectionSolver: loose });
    if (!out.ok) throw new Error(out.message);
    expect(out.result.addedMass!.wetFrequencyBand!.largestRelativeHalfWidth).toBeGreaterThan(0.01);
    expect(out.result.warnings.join(' ')).toMatch(/wet frequencies may be off by up to/);
  });
});
