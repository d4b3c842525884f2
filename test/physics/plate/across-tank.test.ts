import { describe, it, expect } from 'vitest';
import { makeBasis } from '../../../src/physics/plate/basis';
import { dryModes, modeValuesOnGrid } from '../../../src/physics/plate/dry';
import type { DryModes } from '../../../src/physics/plate/dry';
import { influenceTable } from '../../../src/physics/plate/rayleigh';
import { tankAddedMass } from '../../../src/physics/plate/tank';
import type { TankGeometry } from '../../../src/physics/plate/tank';
import { solvePlate } from '../../../src/physics/plate';
import type { PlateInput } from '../../../src/physics/plate';
import { expectClose } from '../../helpers/expect-close';
import { finiteVolumeAddedMass } from './tank-finite-volume';
import { bfsExtrapolated } from './bfs-plate';

const FINE = { widthTerms: 32, depthTerms: 384, gapTerms: 16 };
const DEFAULT = { widthTerms: 16, depthTerms: 144, gapTerms: 6 };

/** The rigid "piston" shape w = 1 (constant function of free–free bases) on an a × b plate. */
function piston(a: number, b: number) {
  const bx = makeBasis(4, a, 'free', 'free')!;
  const by = makeBasis(4, b, 'free', 'free')!;
  const v = new Float64Array(16);
  v[0] = Math.sqrt(a * b); // orthonormal constants are 1/√a and 1/√b
  return { bx, by, v };
}

function firstMode(p: PlateInput): DryModes {
  const r = dryModes(p, 12);
  if (!r.ok) throw new Error(r.message);
  return r.modes;
}

const marrow: PlateInput = {
  widthM: 2, heightM: 1, thicknessM: 0.01, youngsModulusPa: 2.1e11, poissonRatio: 0.3, densityKgPerM3: 7850,
  edges: { left: 'clamped', right: 'clamped', bottom: 'clamped', top: 'free' },
};

const ma = (m: DryModes, tank: TankGeometry, res = DEFAULT) => tankAddedMass(m.bx, m.by, m.vectors, 1, tank, res, 1)![0];

describe('across tank: eigenfunction-series added mass of a plate spanning a tank', () => {
  it('a rigid wall the full liquid depth gets the classical 0.543 ρ a d² per side', () => {
    const { bx, by, v } = piston(2, 1);
    const m = tankAddedMass(bx, by, v, 1, { widthM: 2, heightM: 1, depthM: 1, reachesM: [Infinity] }, DEFAULT, 1000)![0];
    // Rigid vertical wall, incompressible liquid, free surface φ = 0: M = (16/π³) Σ 1/(2n−1)³ ρ a d² = 0.5428 ρ a d²
    // (classical; H.M. Westergaard, "Water pressures on dams during earthquakes", Trans. ASCE 98 (1933) 418,
    // incompressible limit). Σ 1/(2n−1)³ = (7/8) ζ(3) = 1.0517998. Series truncation at 144 terms: ~1e-5.
    expectClose(m, (16 / Math.PI ** 3) * 1.0517998 * 1000 * 2 * 1, { rtol: 1e-4, label: 'rigid wall added mass' });
  });

  it('converges as the series and gap functions are refined, with liquid below and above the top edge', () => {
    const m = firstMode(marrow);
    for (const d of [0.8, 1, 1.5, 2]) {
      const tank = { widthM: 2, heightM: 1, depthM: d, reachesM: [1.5, 1.5] };
      const coarse = ma(m, tank, { widthTerms: 8, depthTerms: 72, gapTerms: 3 });
      const def = ma(m, tank);
      const fine = ma(m, tank, FINE);
      // Convergence criterion (common practice, no source): default within 1.5 % of the fine series, and
      // closer to it than the coarse one. Flow round the sharp top edge makes the gap the slow part.
      expectClose(def, fine, { rtol: 0.015, label: `depth ${d} m, default vs fine` });
      expect(Math.abs(def - fine)).toBeLessThanOrEqual(Math.abs(coarse - fine) + 1e-12);
    }
  });

  it('agrees with an independent finite-volume solve of the whole tank (rigid plate, level at the top edge)', () => {
    const { bx, by, v } = piston(2, 1);
    const series = tankAddedMass(bx, by, v, 1, { widthM: 2, heightM: 1, depthM: 1, reachesM: [1, 1] }, FINE, 1)![0];
    const fv8 = finiteVolumeAddedMass({ widthM: 2, heightM: 1, depthM: 1, reachM: 1, cellsPerM: 8 }, () => 1);
    const fv16 = finiteVolumeAddedMass({ widthM: 2, heightM: 1, depthM: 1, reachM: 1, cellsPerM: 16 }, () => 1);
    // Cross-check: finite volumes on 1/8 and 1/16 m cells, extrapolated as first order (the plate–surface corner
    // limits the order); 1.5 % covers the extrapolation's uncertainty.
    expectClose(series, 2 * fv16 - fv8, { rtol: 0.015, label: 'piston, series vs finite volumes' });
  }, 30_000);

  it('agrees with the finite-volume solve when liquid passes over the free top edge (Marrow Creek plate, 2 m deep)', () => {
    const m = firstMode(marrow);
    const series = ma(m, { widthM: 2, heightM: 1, depthM: 2, reachesM: [1, 1] }, FINE);
    const w = (s: number, z: number) => modeValuesOnGrid(m, m.vectors, 1, Float64Array.of(s), Float64Array.of(z))[0][0];
    const fv8 = finiteVolumeAddedMass({ widthM: 2, heightM: 1, depthM: 2, reachM: 1, cellsPerM: 8 }, w);
    const fv16 = finiteVolumeAddedMass({ widthM: 2, heightM: 1, depthM: 2, reachM: 1, cellsPerM: 16 }, w);
    // Cross-check as above (first-order extrapolation; the edge singularity at the top edge): 2 %.
    expectClose(series, 2 * fv16 - fv8, { rtol: 0.02, label: 'first mode, depth 2 m, series vs finite volumes' });
  }, 30_000);

  it('equals the wall-panel Rayleigh integral over the plate tiled with its mirror images, the limit where the two coincide', () => {
    // With the level at the top edge and far end walls, the tank's side walls and floor (rigid) mirror the plate
    // evenly and the free surface (φ = 0) oddly: the across-tank problem is exactly a panel in an infinite rigid
    // wall whose surface is covered by the plate and its images. Here that tiling is summed with the
    // wall-panel operator (a spatial method) and compared with the series (a spectral one).
    const p: PlateInput = { ...marrow, widthM: 1, heightM: 1, edges: { left: 'clamped', right: 'clamped', bottom: 'clamped', top: 'clamped' } };
    const m = firstMode(p);
    const series = ma(m, { widthM: 1, heightM: 1, depthM: 1, reachesM: [Infinity] }, FINE);
    const c = 12;
    const xs = new Float64Array(c).map((_, i) => (i + 0.5) / c);
    const w = modeValuesOnGrid(m, m.vectors, 1, xs, xs)[0];
    const tiled = (K: number, J: number) => {
      // Tiles s ∈ [−K, K + 1) (even images, period 2) and z ∈ [−J, J) (even about 0, odd about 1: period 4, J a multiple of 4 so the column has no net volume).
      const gx = c * (2 * K + 1);
      const gy = c * 2 * J;
      const f = new Float64Array(gx * gy);
      for (let iy = 0; iy < gy; iy++) for (let ix = 0; ix < gx; ix++) {
        let sp = ((((ix + 0.5) / c - K) % 2) + 2) % 2;
        if (sp > 1) sp = 2 - sp;
        let zp = Math.abs((iy + 0.5) / c - J) % 4;
        let sign = 1;
        if (zp > 3) zp = 4 - zp;
        else if (zp > 2) { zp -= 2; sign = -1; }
        else if (zp > 1) { zp = 2 - zp; sign = -1; }
        f[iy * gx + ix] = sign * w[Math.min(c - 1, Math.floor(zp * c)) * c + Math.min(c - 1, Math.floor(sp * c))];
      }
      const t = influenceTable(gx, gy, 1 / c, 1 / c);
      let s = 0;
      for (let pz = 0; pz < c; pz++) for (let ps = 0; ps < c; ps++) {
        const px = K * c + ps;
        const py = J * c + pz;
        let u = 0;
        for (let qy = 0; qy < gy; qy++) {
          const dj = Math.abs(py - qy);
          for (let qx = 0; qx < gx; qx++) u += t[Math.abs(px - qx) * gy + dj] * f[qy * gx + qx];
        }
        s += w[pz * c + ps] * u;
      }
      return s / (c * c);
    };
    // The truncated image column leaves an end error ∝ 1/J: extrapolate from J = 8 and 16 (first order).
    const extrapolated = 2 * tiled(4, 16) - tiled(4, 8);
    // Cross-check: 12 × 12 cells per tile (Lamb's disc shows ~0.2 % at this density) plus the truncation's residual: 1 %.
    expectClose(series, extrapolated, { rtol: 0.01, label: 'series vs tiled Rayleigh integral' });
  }, 30_000);

  it('a plate clamped on three edges in a tank: more liquid over its free top edge lowers its wet frequency; sloshing is listed', () => {
    const at = (depthM: number) => {
      const r = solvePlate({ ...marrow, liquid: { setting: 'across-tank', densityKgPerM3: 1000, sides: 2, depthM, reachM: 3 } });
      if (!r.ok) throw new Error(r.message);
      return r.result;
    };
    const top = at(1);
    const deep = at(2);
    // Dry: cross-check by Bogner–Fox–Schmit elements (4 and 8 per side, extrapolated), λ = ω a² √(ρh/D), a = 2 m.
    const [lambda] = bfsExtrapolated(marrow, 4, 1);
    const D = (2.1e11 * 1e-6) / (12 * (1 - 0.09));
    const fDry = (lambda / 4) * Math.sqrt(D / (7850 * 0.01)) / (2 * Math.PI);
    expectClose(top.dry.frequenciesHz[0], fDry, { rtol: 0.002, label: 'dry, Ritz vs BFS' });
    // Deeper liquid over the plate adds liquid to move (Kelvin's minimum-energy theorem: classical).
    expect(deep.wet!.frequenciesHz[0]).toBeLessThan(top.wet!.frequenciesHz[0]);
    expect(top.wet!.frequenciesHz[0]).toBeLessThan(top.dry.frequenciesHz[0]);
    // Lowest sloshing across a 2 m wide tank 1 m deep: (1/2π)√(g k tanh(k d)), k = π/2 (classical; H.N. Abramson
    // (ed.), The Dynamic Behavior of Liquids in Moving Containers, NASA SP-106, 1966).
    const k = Math.PI / 2;
    expect(top.sloshing!.some((s) => Math.abs(s.frequencyHz - Math.sqrt(9.80665 * k * Math.tanh(k)) / (2 * Math.PI)) < 1e-9)).toBe(true);
  });
});
