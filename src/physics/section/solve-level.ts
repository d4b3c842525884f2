/**
 * One resolution of the section solve: assemble, factor, solve for the 3K rigid motions and integrate
 * the added-mass matrix m_ij = −ρ ∫_body_i φ_j q_i ds (pressure −ρ ∂φ/∂t on the wetted outline; q_i the
 * generalised normal of motion i). Collocation makes m slightly unsymmetric; the caller reports and
 * removes the asymmetry.
 */
import { createLuFactor, luFactorInPlace, luSolveManyInto, type LuFactor } from '../linalg/lu';
import { assembleInto, createAssemblyWork, rigidNormalVelocities, rowAssembly } from './assemble';
import { findMirror, type Mirror } from './mirror';
import { solveMirrored } from './mirror-solve';
import type { ImageMap } from './lines';
import type { PanelSet } from './panels';
import { hypot2 } from '../linalg/hypot';

export interface LevelSolution {
  panels: PanelSet;
  /** Unknowns per motion, column-wise: motion c at `x[c·n … (c+1)·n)` (φ on Neumann panels, q on Dirichlet). */
  x: Float64Array;
  /** Rigid normal velocities per panel, `q[3j + d]`. */
  q: Float64Array;
  /** Raw added-mass matrix, row-major 3K×3K, before symmetrising. */
  m: Float64Array;
  /** Motions with net flux through the wetted outline (body resting on a wall moving off it). */
  blocked: boolean[];
  /** The section's mirror symmetry at this level (mirror.ts), or null: a hint for the nested levels. */
  mirror: Mirror | null;
}

/**
 * LU workspaces reused across solves, per order and slot (a mirrored solve holds its two halves at once,
 * slots 0 and 1), for orders up to 512 (at most 6 kept, 2 MB each at most): the n² matrix is the solve's
 * largest allocation, and re-allocating it per keystroke cost about a tenth of the time in garbage
 * collection. A workspace is only used within one `solveLevel` call.
 */
const workspaces = new Map<number, LuFactor>();

function luWorkspace(n: number, slot = 0): LuFactor {
  if (n > 512) return createLuFactor(n);
  const key = 2 * n + slot;
  let w = workspaces.get(key);
  if (!w) {
    if (workspaces.size >= 6) workspaces.delete(workspaces.keys().next().value as number);
    w = createLuFactor(n);
    workspaces.set(key, w);
  }
  return w;
}

export type LevelOutcome = { ok: true; level: LevelSolution } | { ok: false; column: number };

export function solveLevel(
  P: PanelSet,
  group: readonly ImageMap[],
  refX: readonly number[],
  refY: readonly number[],
  density: number,
  closed: boolean,
  nearbyMirror: Mirror | null = null,
): LevelOutcome {
  const n = P.count;
  const K = refX.length;
  const m3 = 3 * K;
  let hasDirichlet = false;
  for (let j = 0; j < n; j++) if (P.bc[j] === 1) hasDirichlet = true;
  for (const g of group) if (g.sign < 0) hasDirichlet = true;
  const q = rigidNormalVelocities(P, refX, refY);
  const pin = closed && !hasDirichlet;
  const work = createAssemblyWork(P.nodeCount, group.length);
  const x = new Float64Array(m3 * n);
  // A mirror-symmetric section splits into two half-size systems (mirror-solve.ts): same answer, less work.
  const mirror = findMirror(P, group, nearbyMirror);
  if (mirror) {
    const out = solveMirrored(rowAssembly(P, group, q, K, pin, work), mirror.panel, x, luWorkspace);
    if (!out.ok) return out;
  } else {
    const lu = luWorkspace(n);
    const rhs = new Float64Array(m3 * n);
    assembleInto(P, group, q, K, pin, lu.lu, rhs, work);
    const f = luFactorInPlace(lu);
    if (!f.ok) return { ok: false, column: f.column };
    luSolveManyInto(lu, rhs, m3, x);
  }

  // Without any φ = 0 boundary the rigid motion must carry no net flux through the wetted outline
  // (∮ q ds = 0): otherwise the 2D potential grows like ln r (unbounded added mass) or, in a closed
  // region, has no solution at all. That happens only for a body resting on a wall and moving off it.
  const blocked = new Array<boolean>(m3).fill(false);
  if (!hasDirichlet) {
    for (let k = 0; k < K; k++) {
      for (let d = 0; d < 3; d++) {
        // Compare the flux with the size of the motion's velocities (unit velocity, or unit rotation
        // times the distance from the reference point), not with Σ|q| ds, which is round-off for a
        // circle turning about its centre.
        let flux = 0;
        let scale = 0;
        for (let j = 0; j < n; j++) {
          if (P.owner[j] !== k) continue;
          flux += q[3 * j + d] * P.len[j];
          scale += (d < 2 ? 1 : hypot2(P.mx[j] - refX[k], P.my[j] - refY[k])) * P.len[j];
        }
        if (Math.abs(flux) > 1e-8 * scale) blocked[3 * k + d] = true;
      }
    }
  }

  const m = new Float64Array(m3 * m3);
  for (let j = 0; j < n; j++) {
    const k = P.owner[j];
    if (k < 0) continue;
    const L = P.len[j];
    for (let d = 0; d < 3; d++) {
      const row = (3 * k + d) * m3;
      const w = -density * q[3 * j + d] * L;
      for (let c = 0; c < m3; c++) m[row + c] += w * x[c * n + j];
    }
  }
  for (let c = 0; c < m3; c++) {
    if (!blocked[c]) continue;
    for (let r = 0; r < m3; r++) {
      m[r * m3 + c] = 0;
      m[c * m3 + r] = 0;
    }
  }
  return { ok: true, level: { panels: P, x, q, m, blocked, mirror } };
}
