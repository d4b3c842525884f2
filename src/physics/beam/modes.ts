/**
 * Modes of an assembled member on one mesh: the buckling check (inertia of K + K_G), the banded
 * eigen-solve, and the conversion of eigenvectors into reported mode shapes.
 */
import { createSymBanded, type SymBanded } from '../linalg/banded';
import { factorLdlt } from '../linalg/banded-ldlt';
import { lowestModesBanded } from '../linalg/eigen-lanczos';
import type { MemberSystem } from './assemble';
import type { ModeResult } from './result';
import { signedPeak } from '../linalg/shape-sign';

export type StiffnessCheck = { ok: true } | { ok: false; reason: 'buckles' | 'not-converged'; message: string };

/**
 * K + K_G must be positive definite once the member is restrained (checked before): a negative pivot
 * means the axial compression exceeds a buckling load, and the number of negative pivots is the number
 * of buckling modes passed (Sylvester's law of inertia).
 */
export function checkStiffness(system: MemberSystem): StiffnessCheck {
  const f = factorLdlt(system.kTotal);
  if (f.negativePivots === 0) return { ok: true };
  const t = system.tension;
  if (t.minN >= 0) {
    // Without compression K + K_G is positive definite for a restrained member: a negative pivot is rounding.
    return { ok: false, reason: 'not-converged', message: 'the stiffness matrix lost precision (no compression, yet a negative pivot): check the inputs for extreme values' };
  }
  return {
    ok: false,
    reason: 'buckles',
    message:
      `buckles under this load: axial force down to ${t.minN.toPrecision(4)} N (negative = compression) ` +
      `exceeds the buckling load of the member as supported (${f.negativePivots} buckling mode(s) passed); ` +
      'reduce the compression or add supports.',
  };
}

/** Dry mass plus added mass, for the wet problem. */
export function wetMass(system: MemberSystem): SymBanded {
  const out = createSymBanded(system.n, system.mDry.halfBandwidth);
  const a = system.mAdded;
  for (let i = 0; i < out.data.length; i++) out.data[i] = system.mDry.data[i] + (a ? a.data[i] : 0);
  return out;
}

/**
 * Modes on one mesh. `vectors()` forms the eigenvectors (vector i at `[i·n … (i+1)·n)`) on first call;
 * `release()` says they will not be needed (a mesh the refinement goes past), so the eigen-solver may reuse
 * its work space. Call one of the two for each result.
 */
export type MeshModes =
  | { ok: true; lambdas: Float64Array; vectors: () => Float64Array; release: () => void }
  | { ok: false; reason: 'buckles' | 'not-converged'; message: string };

export function meshModes(system: MemberSystem, mass: SymBanded, count: number): MeshModes {
  const out = lowestModesBanded(system.kTotal, mass, Math.min(count, system.n));
  if (!out.ok) {
    return out.reason === 'not-positive-definite'
      ? { ok: false, reason: 'buckles', message: 'buckles under this load: stiffness is not positive definite' }
      : { ok: false, reason: 'not-converged', message: `eigen-solver: ${out.message}` };
  }
  return { ok: true, lambdas: out.values, vectors: () => out.vectors, release: out.release };
}

/** Reported mode from an M-orthonormal reduced eigenvector x (xᵀ M x = 1). */
export function modeResult(system: MemberSystem, lambda: number, x: Float64Array, mode: number, addedMass: SymBanded | null): ModeResult {
  const nodes = system.mesh.z.length;
  const w = new Float64Array(nodes);
  for (let i = 0; i < nodes; i++) {
    const r = system.dofMap[2 * i];
    w[i] = r >= 0 ? x[r] : 0;
  }
  // ±(largest |w|), signed so that the first node at the peak (ties within a relative 1e-6) comes out +1.
  const big = signedPeak(w);
  const omega = Math.sqrt(Math.max(lambda, 0));
  const f = omega / (2 * Math.PI);
  const result: ModeResult = {
    mode,
    frequencyHz: f,
    periodS: f > 0 ? 1 / f : Infinity,
    // For φ = x / w_max: φᵀMφ = xᵀMx / w_max² = 1 / w_max².
    modalMassKg: big !== 0 ? 1 / (big * big) : 0,
    shape: { zM: Array.from(system.mesh.z), displacement: Array.from(w, (v) => (big !== 0 ? v / big : 0)) },
  };
  if (addedMass) {
    // Kinetic energy share of the liquid: xᵀ M_a x / xᵀ M x with xᵀ M x = 1.
    const b = addedMass.halfBandwidth;
    const d = addedMass.data;
    let s = 0;
    for (let i = 0; i < system.n; i++) {
      s += d[i * (b + 1)] * x[i] * x[i];
      for (let k = 1; k <= b && i + k < system.n; k++) s += 2 * d[i * (b + 1) + k] * x[i] * x[i + k];
    }
    result.liquidKineticEnergyShare = s;
  }
  return result;
}
