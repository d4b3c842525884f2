/**
 * Wet modes: the liquid's kinetic energy as an added-mass matrix M_a on the first `count` dry modes
 * (generalised coordinates q, w = Σ q_k w_k), then the coupled problem
 *   ρh diag(ω_k²) q = ω² (ρh I + M_a) q
 * so wet modes mix dry ones where the liquid couples them (Rayleigh–Ritz on the dry modes; e.g.
 * M.K. Kwak, "Hydroelastic vibration of rectangular plates", J. Appl. Mech. 63 (1996) 110).
 */
import { denseGeneralizedEigen } from '../linalg/eigen-dense';

export type WetOutcome =
  | { ok: true; omega2: Float64Array; /** mode r's dry-mode coordinates at [r·count …) */ q: Float64Array }
  | { ok: false; reason: 'added-mass-not-positive' | 'not-converged'; message: string };

export function wetModes(dryOmega2: Float64Array, count: number, surfaceMassKgPerM2: number, addedMass: Float64Array): WetOutcome {
  const k = new Float64Array(count * count);
  const m = Float64Array.from(addedMass);
  for (let i = 0; i < count; i++) {
    k[i * count + i] = surfaceMassKgPerM2 * dryOmega2[i];
    m[i * count + i] += surfaceMassKgPerM2;
  }
  const eig = denseGeneralizedEigen(k, m, count);
  if (!eig.ok) {
    return eig.reason === 'mass-not-positive-definite'
      ? { ok: false, reason: 'added-mass-not-positive', message: 'the plate mass plus added mass is not positive definite (liquid discretisation failed)' }
      : { ok: false, reason: 'not-converged', message: eig.message };
  }
  return { ok: true, omega2: eig.values, q: eig.vectors };
}

/** Ritz coefficients of wet modes: row r = Σ_k q[r·count + k] · dry vector k. */
export function combineVectors(dryVectors: Float64Array, n: number, q: Float64Array, count: number, modes: number): Float64Array {
  const out = new Float64Array(modes * n);
  for (let r = 0; r < modes; r++) {
    for (let k = 0; k < count; k++) {
      const c = q[r * count + k];
      for (let j = 0; j < n; j++) out[r * n + j] += c * dryVectors[k * n + j];
    }
  }
  return out;
}

/** For each wet mode, the dry mode with the largest coordinate (the one it resembles most). */
export function dominantDryMode(q: Float64Array, count: number, modes: number): number[] {
  const out: number[] = [];
  for (let r = 0; r < modes; r++) {
    let best = 0;
    for (let k = 1; k < count; k++) if (Math.abs(q[r * count + k]) > Math.abs(q[r * count + best])) best = k;
    out.push(best);
  }
  return out;
}
