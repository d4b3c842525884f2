/**
 * Global banded matrices of a member on a given mesh. DOFs: node i carries 2i (lateral displacement w, m)
 * and 2i+1 (rotation, rad: θ = dw/dz for Euler–Bernoulli, the section rotation ψ for Timoshenko). Supports fix DOFs (clamped: w and θ; pinned: w; guided: θ), which are
 * eliminated from the numbering, so the matrices keep half-bandwidth 3; springs and lumped masses sit on
 * the diagonal.
 */
import { createSymBanded, type SymBanded, symBandedAdd } from '../linalg/banded';
import type { AddedMassPlan } from './added-mass';
import { addElementIntegral, CURVATURE, GAUSS_N, SLOPE, VALUE } from './element';
import { addTimoshenkoElement, type TimoshenkoSamples } from './element-timoshenko';
import { type Mesh, nodeAt } from './mesh';
import type { MemberModel } from './model';
import { gaussProps, prismaticCache } from './gauss-props';
import { type TensionField, tensionField } from './tension';

export const HALF_BANDWIDTH = 3;

export interface MemberSystem {
  mesh: Mesh;
  /** Full DOF (2·node + 0|1) → reduced index, or −1 where a support fixes it. */
  dofMap: Int32Array;
  /** Number of free DOFs. */
  n: number;
  /** Bending + springs + soil, N/m and N·m/rad. */
  kElastic: SymBanded;
  /** Geometric stiffness from axial tension. */
  kGeometric: SymBanded;
  /** kElastic + kGeometric. */
  kTotal: SymBanded;
  /** Structure + contents + coating + lumped masses, kg and kg·m². */
  mDry: SymBanded;
  /** Added mass of the liquid on submerged elements (null when no plan is given). */
  mAdded: SymBanded | null;
  tension: TensionField;
}

/** Full-DOF fixity flags from the supports: bit 1 = w fixed, bit 2 = θ fixed. */
function fixity(model: MemberModel, mesh: Mesh): Uint8Array {
  const fixed = new Uint8Array(mesh.z.length);
  for (const s of model.supports) {
    const node = nodeAt(mesh, s.atM);
    if (s.kind === 'clamped') fixed[node] |= 3;
    else if (s.kind === 'pinned') fixed[node] |= 1;
    else if (s.kind === 'guided') fixed[node] |= 2;
  }
  return fixed;
}

export function assembleMember(model: MemberModel, mesh: Mesh, plan: AddedMassPlan | null): MemberSystem {
  const nodes = mesh.z.length;
  const ne = nodes - 1;
  const fixed = fixity(model, mesh);
  const dofMap = new Int32Array(2 * nodes);
  let n = 0;
  for (let i = 0; i < nodes; i++) {
    dofMap[2 * i] = fixed[i] & 1 ? -1 : n++;
    dofMap[2 * i + 1] = fixed[i] & 2 ? -1 : n++;
  }
  const kE = createSymBanded(n, HALF_BANDWIDTH);
  const kG = createSymBanded(n, HALF_BANDWIDTH);
  const mD = createSymBanded(n, HALF_BANDWIDTH);
  const mA = plan ? createSymBanded(n, HALF_BANDWIDTH) : null;
  const cache = prismaticCache(model);
  const tension = tensionField(model, mesh, cache);
  const props = gaussProps(model, mesh, plan, cache);

  const ei = new Float64Array(GAUSS_N);
  const mass = new Float64Array(GAUSS_N);
  const added = new Float64Array(GAUSS_N);
  const soil = new Float64Array(GAUSS_N);
  const kga = new Float64Array(GAUSS_N);
  const rotary = new Float64Array(GAUSS_N);
  const timoshenko = model.beamTheory === 'timoshenko';
  const samples: TimoshenkoSamples = { ei, kga, mass, rotary, added, soil, tension: tension.atGauss, tensionOffset: 0 };
  const ke = new Float64Array(16);
  const kg = new Float64Array(16);
  const me = new Float64Array(16);
  const ma = new Float64Array(16);
  const dofs = new Int32Array(4);
  for (let e = 0; e < ne; e++) {
    const h = mesh.z[e + 1] - mesh.z[e];
    const wet = plan !== null && mesh.submerged[e] === 1;
    const o = e * GAUSS_N;
    // Copied value by value: a subarray view per property and element would be garbage by the thousand.
    for (let g = 0; g < GAUSS_N; g++) {
      ei[g] = props.ei[o + g];
      mass[g] = props.mass[o + g];
      added[g] = props.added[o + g];
      kga[g] = props.kga[o + g];
      rotary[g] = props.rotary[o + g];
    }
    soil.fill(mesh.soilModulus[e]);
    ke.fill(0);
    kg.fill(0);
    me.fill(0);
    ma.fill(0);
    if (timoshenko) {
      samples.tensionOffset = e * GAUSS_N;
      addTimoshenkoElement(h, samples, { k: ke, kg, m: me, ma });
    } else {
      addElementIntegral(CURVATURE, h, ei, 0, ke);
      // Winkler soil springs: consistent spring matrix ∫ k_s N Nᵀ dz, same pattern as the consistent mass.
      if (mesh.soilModulus[e] > 0) addElementIntegral(VALUE, h, soil, 0, ke);
      addElementIntegral(SLOPE, h, tension.atGauss, e * GAUSS_N, kg);
      addElementIntegral(VALUE, h, mass, 0, me);
      if (wet) addElementIntegral(VALUE, h, added, 0, ma);
    }
    for (let a = 0; a < 4; a++) dofs[a] = dofMap[2 * e + a];
    for (let a = 0; a < 4; a++) {
      const ra = dofs[a];
      if (ra < 0) continue;
      for (let b = 0; b < 4; b++) {
        const rb = dofs[b];
        if (rb < ra) continue;
        symBandedAdd(kE, ra, rb, ke[a * 4 + b]);
        symBandedAdd(kG, ra, rb, kg[a * 4 + b]);
        symBandedAdd(mD, ra, rb, me[a * 4 + b]);
        if (mA) symBandedAdd(mA, ra, rb, ma[a * 4 + b]);
      }
    }
  }
  for (const s of model.supports) {
    if (s.kind !== 'spring') continue;
    const node = nodeAt(mesh, s.atM);
    const rw = dofMap[2 * node];
    const rt = dofMap[2 * node + 1];
    if (rw >= 0 && s.translationalStiffnessNPerM) symBandedAdd(kE, rw, rw, s.translationalStiffnessNPerM);
    if (rt >= 0 && s.rotationalStiffnessNmPerRad) symBandedAdd(kE, rt, rt, s.rotationalStiffnessNmPerRad);
  }
  for (const m of model.masses ?? []) {
    const node = nodeAt(mesh, m.atM);
    const rw = dofMap[2 * node];
    const rt = dofMap[2 * node + 1];
    if (rw >= 0) symBandedAdd(mD, rw, rw, m.massKg);
    if (rt >= 0 && m.rotaryInertiaKgM2) symBandedAdd(mD, rt, rt, m.rotaryInertiaKgM2);
  }
  const kT = createSymBanded(n, HALF_BANDWIDTH);
  for (let i = 0; i < kT.data.length; i++) kT.data[i] = kE.data[i] + kG.data[i];
  return { mesh, dofMap, n, kElastic: kE, kGeometric: kG, kTotal: kT, mDry: mD, mAdded: mA, tension };
}
