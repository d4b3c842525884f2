/**
 * Mirror-symmetric sections are solved as two half-size systems (mirror.ts, mirror-solve.ts). Checked here:
 * which layouts are found symmetric, and that the halves give the whole system's solution to round-off
 * (cross-check against assembling and factoring the whole matrix).
 */
import { describe, expect, test } from 'vitest';
import { assembleInto, createAssemblyWork, rigidNormalVelocities } from '../../../src/physics/section/assemble';
import { findMirror } from '../../../src/physics/section/mirror';
import { buildModel } from '../../../src/physics/section/model';
import { buildPanels } from '../../../src/physics/section/panels';
import { solveLevel } from '../../../src/physics/section/solve-level';
import { createLuFactor, luFactorInPlace, luSolveManyInto } from '../../../src/physics/linalg/lu';
import type { SectionInput } from '../../../src/physics/section/types';
import { RHO } from './helpers';

const wall = { kind: 'wall' as const, pointM: [0, 0] as [number, number], normal: [0, 1] as [number, number] };

// Invented layouts.
const symmetric: [string, SectionInput][] = [
  ['four circles in a row 0.1 D above a wall', { liquidDensityKgPerM3: RHO, bodies: [0, 1, 2, 3].map((k) => ({ shape: 'circle' as const, diameterM: 0.5, centerM: [0.8 * k, 0.3] as [number, number] })), boundaries: [wall] }],
  ['a vertical plate beside a wall', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'plate', widthM: 0.25, thicknessM: 0.012, angleDeg: 90 }], boundaries: [{ kind: 'wall', pointM: [-0.046, 0], normal: [1, 0] }] }],
  ['a circle off-centre in a circular enclosure', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle', diameterM: 0.32 }], boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 0.61, centerM: [-0.05, 0] }] }],
  ['an ellipse turned 25°, mirrored about its own axes', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'ellipse', widthM: 1, heightM: 0.4, angleDeg: 25 }] }],
  ['a rounded rectangle under a free surface', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'rectangle', widthM: 0.4, heightM: 0.3, cornerRadiusM: 0.03, centerM: [0.5, -0.5] }], boundaries: [{ kind: 'free-surface', pointM: [0, 0], normal: [0, -1] }] }],
  ['a circle centred in a wall corner, on the corner\'s bisector', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle', diameterM: 0.4, centerM: [0.5, 0.5] }], boundaries: [wall, { kind: 'wall', pointM: [0, 0], normal: [1, 0] }] }],
  ['a circle in a rectangular tank with a free surface and a floor', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle', diameterM: 0.4, centerM: [0, 0.5] }], boundaries: [{ kind: 'enclosure', shape: 'rectangle', widthM: 2, heightM: 2, centerM: [0, 1] }, wall, { kind: 'free-surface', pointM: [0, 1.5], normal: [0, -1] }] }],
];

const asymmetric: [string, SectionInput][] = [
  ['three different bodies in a circular enclosure', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle', diameterM: 0.4, centerM: [-0.9, 0.05] }, { shape: 'rectangle', widthM: 0.4, heightM: 0.2, cornerRadiusM: 0.02, centerM: [0.8, 0.03], angleDeg: 30 }, { shape: 'ellipse', widthM: 0.5, heightM: 0.25, centerM: [0, 0.85] }], boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 3.2 }] }],
  ['two circles of different sizes above a wall, off one line', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle', diameterM: 0.5, centerM: [0, 0.3] }, { shape: 'circle', diameterM: 0.4, centerM: [0.8, 0.4] }], boundaries: [wall] }],
  ['a rounded rectangle in a wall corner under a free surface (its own axes move the corner lines)', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'rectangle', widthM: 0.4, heightM: 0.3, cornerRadiusM: 0.03, centerM: [0.5, -0.5] }], boundaries: [{ kind: 'wall', pointM: [0, 0], normal: [1, 0] }, { kind: 'free-surface', pointM: [0, 0], normal: [0, -1] }] }],
  ['a circle a micrometre off the axis of an otherwise symmetric pair', { liquidDensityKgPerM3: RHO, bodies: [{ shape: 'circle', diameterM: 0.5, centerM: [0, 0.3] }, { shape: 'circle', diameterM: 0.5, centerM: [0.8, 0.300001] }], boundaries: [wall] }],
];

/** The level's unknowns from the whole matrix: assemble all rows, factor, solve. */
function wholeSolve(input: SectionInput, factor: number): { x: Float64Array; n: number } {
  const model = buildModel(input, 32);
  const P = buildPanels(model.spans, factor);
  const K = input.bodies.length;
  const q = rigidNormalVelocities(P, model.refX, model.refY);
  let dirichlet = false;
  for (let j = 0; j < P.count; j++) if (P.bc[j] === 1) dirichlet = true;
  for (const g of model.group) if (g.sign < 0) dirichlet = true;
  const lu = createLuFactor(P.count);
  const rhs = new Float64Array(3 * K * P.count);
  assembleInto(P, model.group, q, K, model.closed && !dirichlet, lu.lu, rhs, createAssemblyWork(P.nodeCount, model.group.length));
  expect(luFactorInPlace(lu).ok).toBe(true);
  const x = new Float64Array(3 * K * P.count);
  luSolveManyInto(lu, rhs, 3 * K, x);
  return { x, n: P.count };
}

describe('mirror symmetry of the section', () => {
  for (const [name, input] of symmetric) {
    test(`is found for ${name}, and the two halves give the whole system's solution to round-off (cross-check)`, () => {
      const model = buildModel(input, 32);
      for (const factor of [1, 2]) {
        const P = buildPanels(model.spans, factor);
        const mirror = findMirror(P, model.group);
        expect(mirror, `mirror at level ${factor}`).not.toBeNull();
        const level = solveLevel(P, model.group, model.refX, model.refY, RHO, model.closed);
        if (!level.ok) throw new Error(`level ${factor} singular at ${level.column}`);
        const whole = wholeSolve(input, factor);
        let scale = 0;
        let worst = 0;
        for (let i = 0; i < whole.x.length; i++) {
          scale = Math.max(scale, Math.abs(whole.x[i]));
          worst = Math.max(worst, Math.abs(level.level.x[i] - whole.x[i]));
        }
        // Two factorisations of well-conditioned second-kind systems against one: a few hundred ulps of the largest unknown.
        expect(worst, `level ${factor}: largest difference against the whole solve`).toBeLessThan(1e-12 * scale);
      }
    });
  }

  for (const [name, input] of asymmetric) {
    test(`is not claimed for ${name}`, () => {
      const model = buildModel(input, 32);
      expect(findMirror(buildPanels(model.spans, 1), model.group)).toBeNull();
    });
  }

  test('proposed from a nested level (twice or half the panels), it is the permutation the search finds', () => {
    for (const [, input] of symmetric.slice(0, 3)) {
      const model = buildModel(input, 32);
      const levels = [1, 2, 4].map((f) => buildPanels(model.spans, f));
      const searched = levels.map((P) => findMirror(P, model.group));
      for (let l = 0; l < 3; l++) {
        for (const from of [l - 1, l + 1]) {
          if (from < 0 || from > 2) continue;
          const proposed = findMirror(levels[l], model.group, searched[from]);
          expect(Array.from(proposed?.panel ?? [])).toEqual(Array.from(searched[l]?.panel ?? [null]));
        }
      }
    }
  });

  test('a wrong hint is checked and not trusted: the search decides', () => {
    const model = buildModel(symmetric[0][1], 32);
    const coarse = findMirror(buildPanels(model.spans, 1), model.group);
    if (!coarse) throw new Error('no mirror found');
    // Every panel its own mirror, on the right line: a permutation of the right size that is no symmetry.
    const wrong = { ...coarse, panel: Int32Array.from(coarse.panel, (_, j) => j) };
    const P = buildPanels(model.spans, 2);
    const found = findMirror(P, model.group, wrong);
    expect(Array.from(found?.panel ?? [])).toEqual(Array.from(findMirror(P, model.group)?.panel ?? [null]));
    expect(found?.panel.some((k, j) => k !== j)).toBe(true);
  });

  test('pairs each panel with one that runs the other way, and maps panels crossed by the line to themselves', () => {
    // A 2 × 1 rectangle: its 16 coarse panels are shared 5, 3, 5, 3 between the sides by length, so the x axis
    // crosses one panel of each short side at its midpoint.
    const model = buildModel({ liquidDensityKgPerM3: RHO, bodies: [{ shape: 'rectangle', widthM: 2, heightM: 1 }] }, 64);
    const P = buildPanels(model.spans, 1);
    const found = findMirror(P, model.group);
    if (!found) throw new Error('no mirror found');
    const mirror = found.panel;
    let self = 0;
    for (let j = 0; j < P.count; j++) {
      const k = mirror[j];
      expect(mirror[k]).toBe(j);
      if (k === j) self++;
      expect(P.my[k]).toBeCloseTo(-P.my[j], 12);
      expect(P.mx[k]).toBeCloseTo(P.mx[j], 12);
      // Reversed direction: the mirror's tangent is the reflected tangent turned round.
      expect(P.tx[k]).toBeCloseTo(-P.tx[j], 12);
      expect(P.ty[k]).toBeCloseTo(P.ty[j], 12);
    }
    expect(self).toBeGreaterThan(0);
  });
});
