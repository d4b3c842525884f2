import { describe, it, expect } from 'vitest';
import { solvePlate } from '../../../src/physics/plate';
import type { PlateInput } from '../../../src/physics/plate';

const baffle: PlateInput = {
  widthM: 2, heightM: 1, thicknessM: 0.01, youngsModulusPa: 2.1e11, poissonRatio: 0.3, densityKgPerM3: 7850,
  edges: { left: 'clamped', right: 'clamped', bottom: 'clamped', top: 'free' },
  liquid: { setting: 'across-tank', densityKgPerM3: 1000, sides: 2, depthM: 2, reachM: 3 },
};

describe('the plate solver’s result', () => {
  it('carries dry and wet mode shapes on the drawing grid, scaled to a largest deflection of 1, edges included', () => {
    const r = solvePlate(baffle);
    if (!r.ok) throw new Error(r.message);
    const { nx, ny } = r.result.grid;
    expect(nx).toBe(21); // longer side
    expect(ny).toBe(11);
    for (const set of [r.result.dry, r.result.wet!]) {
      expect(set.shapes).toHaveLength(6);
      for (const s of set.shapes) {
        expect(s).toHaveLength(nx * ny);
        expect(Math.max(...s.map(Math.abs))).toBeCloseTo(1, 12);
        // Clamped bottom edge: zero deflection along iy = 0 (boundary factor of the trial functions).
        for (let ix = 0; ix < nx; ix++) expect(Math.abs(s[ix])).toBeLessThan(1e-12);
      }
    }
    // The first mode of a plate clamped on three sides with a free top moves most at the top edge.
    const first = r.result.dry.shapes[0];
    expect(Math.abs(first[(ny - 1) * nx + (nx - 1) / 2])).toBeCloseTo(1, 6);
  });

  it('reports the method, validity, an error estimate below 1 % and the sloshing excitations', () => {
    const r = solvePlate(baffle);
    if (!r.ok) throw new Error(r.message);
    expect(r.result.method.join(' ')).toMatch(/Rayleigh–Ritz.*eigenfunction series/s);
    expect(r.result.validity.join(' ')).toContain('well above sloshing');
    // Two resolutions differ by well under 1 % at the defaults (convergence studies in the other plate tests).
    for (const e of [...r.result.errorEstimate.dryRelative, ...r.result.errorEstimate.wetRelative]) expect(e).toBeLessThan(0.01);
    expect(r.result.sloshing!.length).toBeGreaterThanOrEqual(3);
    for (const x of r.result.wetToDryRatio) {
      expect(x).toBeGreaterThan(0);
      expect(x).toBeLessThan(1); // added mass only lowers frequencies (Rayleigh quotient, classical)
    }
  });

  it('a gap expansion richer than the depth series is a typed failure, not NaN', () => {
    // 8 gap functions seen through 2 depth terms make the gap system singular.
    const r = solvePlate(baffle, { tankDepthTerms: 2, gapTerms: 8 });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toContain('gap');
  });

  it('a thick plate gets a note that shear deformation is left out', () => {
    const r = solvePlate({ ...baffle, thicknessM: 0.08, liquid: undefined });
    if (!r.ok) throw new Error(r.message);
    expect(r.result.notes.join(' ')).toContain('shear deformation');
    expect(r.result.wet).toBeNull();
  });
});
