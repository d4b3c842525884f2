/**
 * The assembly that loads each panel once for all images matches the plain image-by-image loop it
 * replaced (kept here as the reference): the matrix bit for bit, the right-hand sides to round-off.
 */
import { describe, expect, test } from 'vitest';
import { assembleInto, createAssemblyWork, panelAngle, rigidNormalVelocities } from '../../../src/physics/section/assemble';
import { buildModel } from '../../../src/physics/section/model';
import { buildPanels, type PanelSet } from '../../../src/physics/section/panels';
import type { ImageMap } from '../../../src/physics/section/lines';
import type { SectionInput } from '../../../src/physics/section/types';
import { expectClose } from '../../helpers/expect-close';

const INV_2PI = 1 / (2 * Math.PI);

/** The image-by-image assembly as it was before the panels were loaded once for all images. */
function referenceAssemble(P: PanelSet, group: readonly ImageMap[], q: Float64Array, bodyCount: number, pin: boolean, a: Float64Array, rhs: Float64Array): void {
  const n = P.count;
  const { nodeX, nodeY, pa, pb, tx, ty, nx, ny, len, bc, owner } = P;
  const rx = new Float64Array(P.nodeCount);
  const ry = new Float64Array(P.nodeCount);
  const lnr = new Float64Array(P.nodeCount);
  a.fill(0);
  rhs.fill(0, 0, 3 * bodyCount * n);
  let totalLen = 0;
  for (let j = 0; j < n; j++) totalLen += len[j];
  for (let i = 0; i < n; i++) {
    const row = i * n;
    for (let g = 0; g < group.length; g++) {
      const G = group[g];
      const x = G.m00 * P.mx[i] + G.m01 * P.my[i] + G.c0;
      const y = G.m10 * P.mx[i] + G.m11 * P.my[i] + G.c1;
      const sg = G.sign * INV_2PI;
      for (let k = 0; k < P.nodeCount; k++) {
        const dx = nodeX[k] - x;
        const dy = nodeY[k] - y;
        const r2 = dx * dx + dy * dy;
        rx[k] = dx;
        ry[k] = dy;
        lnr[k] = r2 > 0 ? 0.5 * Math.log(r2) : 0;
      }
      for (let j = 0; j < n; j++) {
        const ia = pa[j];
        const L = len[j];
        const u1 = rx[ia] * tx[j] + ry[ia] * ty[j];
        const h = rx[ia] * nx[j] + ry[ia] * ny[j];
        const u2 = u1 + L;
        const theta = g === 0 && j === i ? 0 : panelAngle(h * L, u1 * u2 + h * h);
        if (bc[j] === 0) {
          a[row + j] += sg * theta;
          const k = owner[j];
          if (k >= 0) {
            const s = -sg * (u2 * lnr[pb[j]] - u1 * lnr[ia] - L + h * theta);
            const c0 = 3 * k * n + i;
            rhs[c0] -= s * q[3 * j];
            rhs[c0 + n] -= s * q[3 * j + 1];
            rhs[c0 + 2 * n] -= s * q[3 * j + 2];
          }
        } else {
          a[row + j] += -sg * (u2 * lnr[pb[j]] - u1 * lnr[ia] - L + h * theta);
        }
      }
    }
    if (bc[i] === 0) a[row + i] += 0.5;
    if (pin) for (let j = 0; j < n; j++) a[row + j] += len[j] / totalLen;
  }
}

// Invented layouts: one image (open liquid), two (a wall), four (a wall and a free surface at right angles),
// and a closed enclosure with a free surface (Dirichlet panels) and without (pinned).
const cases: [string, SectionInput, boolean][] = [
  ['a rectangle in open liquid', { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'rectangle', widthM: 0.6, heightM: 0.3, cornerRadiusM: 0.03 }] }, false],
  ['four circles 0.1 D above a wall', { liquidDensityKgPerM3: 1000, bodies: [0, 1, 2, 3].map((k) => ({ shape: 'circle' as const, diameterM: 0.5, centerM: [0.8 * k, 0.3] as [number, number] })), boundaries: [{ kind: 'wall', pointM: [0, 0], normal: [0, 1] }] }, false],
  ['an ellipse in a wall corner under a free surface', { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'ellipse', widthM: 0.5, heightM: 0.3, centerM: [0.6, -0.5] }], boundaries: [{ kind: 'wall', pointM: [0, 0], normal: [1, 0] }, { kind: 'free-surface', pointM: [0, 0], normal: [0, -1] }] }, false],
  ['two bodies in a circular enclosure', { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'circle', diameterM: 0.4, centerM: [-0.5, 0] }, { shape: 'rectangle', widthM: 0.4, heightM: 0.2, centerM: [0.5, 0.1], angleDeg: 30 }], boundaries: [{ kind: 'enclosure', shape: 'circle', diameterM: 2 }] }, true],
  ['a circle in a rectangular tank with a free surface', { liquidDensityKgPerM3: 1000, bodies: [{ shape: 'circle', diameterM: 0.4, centerM: [0, -0.4] }], boundaries: [{ kind: 'enclosure', shape: 'rectangle', widthM: 2, heightM: 2 }, { kind: 'free-surface', pointM: [0, 0], normal: [0, -1] }] }, false],
];

describe('section assembly, all images per panel load', () => {
  for (const [name, input, pin] of cases) {
    test(`gives the same matrix bit for bit and the same right-hand sides to round-off for ${name} (cross-check)`, () => {
      const model = buildModel(input, 32);
      const P = buildPanels(model.spans, 1);
      const n = P.count;
      const K = input.bodies.length;
      const q = rigidNormalVelocities(P, model.refX, model.refY);
      const a0 = new Float64Array(n * n);
      const r0 = new Float64Array(3 * K * n);
      referenceAssemble(P, model.group, q, K, pin, a0, r0);
      const a1 = new Float64Array(n * n).fill(7); // stale contents must be overwritten
      const r1 = new Float64Array(3 * K * n).fill(7);
      assembleInto(P, model.group, q, K, pin, a1, r1, createAssemblyWork(P.nodeCount));
      let diff = 0;
      for (let i = 0; i < n * n; i++) if (a1[i] !== a0[i]) diff++;
      expect(diff).toBe(0);
      let scale = 0;
      for (const v of r0) scale = Math.max(scale, Math.abs(v));
      expect(scale).toBeGreaterThan(0);
      // The images' S_ij are added before multiplying by q_j: a few roundings per term over ~100 terms.
      for (let i = 0; i < r0.length; i++) expectClose(r1[i], r0[i], { atol: 1e-14 * scale, label: `rhs[${i}]` });
    });
  }
});
