import { describe, it, expect } from 'vitest';
import { clearPlateMemos, solvePlate } from '../../../src/physics/plate';
import type { PlateInput, PlateResult } from '../../../src/physics/plate';
import { BoundedMemo } from '../../../src/physics/memo/bounded-memo';
import { influenceTable, rayleighAddedMass } from '../../../src/physics/plate/rayleigh';
import { expectClose } from '../../helpers/expect-close';

const baffle: PlateInput = {
  widthM: 2, heightM: 1, thicknessM: 0.01, youngsModulusPa: 2.1e11, poissonRatio: 0.3, densityKgPerM3: 7850,
  edges: { left: 'clamped', right: 'clamped', bottom: 'clamped', top: 'free' },
  liquid: { setting: 'across-tank', densityKgPerM3: 1000, sides: 2, depthM: 2, reachM: 3 },
};

function solved(p: PlateInput): PlateResult {
  const r = solvePlate(p);
  if (!r.ok) throw new Error(r.message);
  return r.result;
}

function coldSolve(p: PlateInput): PlateResult {
  clearPlateMemos();
  return solved(p);
}

/** Cross-check: every frequency and error estimate of a memo-served solve against a first solve of the same input. */
function expectSame(got: PlateResult, cold: PlateResult, what: string): void {
  const pairs: [number[], number[], string][] = [
    [got.dry.frequenciesHz, cold.dry.frequenciesHz, 'dry'],
    [got.wet?.frequenciesHz ?? [], cold.wet?.frequenciesHz ?? [], 'wet'],
    [got.wetToDryRatio, cold.wetToDryRatio, 'wet/dry'],
  ];
  for (const [a, b, label] of pairs) {
    expect(a).toHaveLength(b.length);
    // Same arithmetic on the same numbers except the order of one scaling: round-off only.
    a.forEach((x, i) => expectClose(x, b[i], { rtol: 1e-12, label: `${what}, ${label} mode ${i + 1}` }));
  }
}

describe('the plate engine’s memo of shapes and added mass', () => {
  it('keeps at most its capacity, dropping the least recently used entry', () => {
    const memo = new BoundedMemo<number>(2);
    let made = 0;
    const make = (v: number) => () => (made++, v);
    memo.get('a', make(1));
    memo.get('b', make(2));
    memo.get('a', make(99)); // a hit: a becomes the most recent
    memo.get('c', make(3)); // drops b
    expect(memo.get('a', make(99))).toBe(1);
    expect(memo.get('b', make(4))).toBe(4); // b was dropped and is made again
    expect(made).toBe(4);
  });

  it('a keystroke on the thickness, the plate density or the liquid density, served from the memo, gives the first solve’s answer', () => {
    const edits: [string, PlateInput][] = [
      ['thickness 12 mm', { ...baffle, thicknessM: 0.012 }],
      ['plate density 7700', { ...baffle, densityKgPerM3: 7700 }],
      ['liquid density 1025', { ...baffle, liquid: { ...baffle.liquid!, densityKgPerM3: 1025 } }],
      ['Young’s modulus 200 GPa', { ...baffle, youngsModulusPa: 2.0e11 }],
    ];
    for (const [what, edited] of edits) {
      const cold = coldSolve(edited);
      clearPlateMemos();
      solved(baffle); // the memo now holds the unedited plate's shapes and added mass
      expectSame(solved(edited), cold, what);
    }
  });

  it('an edge spring memoised for one thickness still prices the spring right at another (k_r / D is in the key)', () => {
    const sprung: PlateInput = { ...baffle, liquid: undefined, edges: { ...baffle.edges, top: { rotationalSpringNmPerRadPerM: 2e4 } } };
    const thicker = { ...sprung, thicknessM: 0.015 };
    const cold = coldSolve(thicker);
    clearPlateMemos();
    solved(sprung);
    expectSame(solved(thicker), cold, 'spring edge, thickness 15 mm');
  });

  it('a change of width or liquid depth is not served from the memo (its answer differs and matches a first solve)', () => {
    clearPlateMemos();
    const before = solved(baffle);
    for (const edited of [{ ...baffle, widthM: 2.1 }, { ...baffle, liquid: { ...baffle.liquid!, depthM: 1.5 } }]) {
      const got = solved(edited);
      expect(got.wet!.frequenciesHz[0]).not.toBeCloseTo(before.wet!.frequenciesHz[0], 6);
      expectSame(got, coldSolve(edited), 'edited geometry');
      solved(baffle);
    }
  });
});

describe('the Rayleigh added mass folded by the grid’s mirror symmetry', () => {
  it('equals the direct double sum over all cell pairs for shapes with no symmetry, odd and even grids', () => {
    for (const [gx, gy, reach] of [[7, 4, 0.3], [6, 9, undefined], [5, 5, 1]] as const) {
      const dx = 0.1;
      const dy = 0.07;
      const shapes = [0, 1, 2].map((k) => Float64Array.from({ length: gx * gy }, (_, c) => Math.sin(1.3 * k + 0.7 * c) + 0.1 * k * (c % gx)));
      const m = rayleighAddedMass(shapes, gx, gy, dx, dy, 1000, reach);
      // Cross-check: M_a,ij = ρ dA Σ_P Σ_Q w_i(P) κ(P, Q) w_j(Q) with κ from the same influence table.
      const t = influenceTable(gx, gy, dx, dy, reach);
      for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) {
        let s = 0;
        for (let p = 0; p < gx * gy; p++) for (let q = 0; q < gx * gy; q++) {
          s += shapes[i][p] * t[Math.abs((p % gx) - (q % gx)) * gy + Math.abs(Math.floor(p / gx) - Math.floor(q / gx))] * shapes[j][q];
        }
        // The same sums in another order: round-off only.
        expectClose(m[i * 3 + j], 1000 * dx * dy * s, { rtol: 1e-11, atol: 1e-11 * Math.abs(m[0]), label: `${gx} × ${gy} grid, M_a[${i}][${j}]` });
      }
    }
  });
});
