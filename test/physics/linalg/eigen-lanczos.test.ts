import { describe, expect, it } from 'vitest';
import { createSymBanded, symBandedAdd, symBandedMul, symBandedToDense, type SymBanded } from '../../../src/physics/linalg/banded';
import { lowestModesBanded } from '../../../src/physics/linalg/eigen-lanczos';
import { denseGeneralizedEigen } from '../../../src/physics/linalg/eigen-dense';
import { expectClose } from '../../helpers/expect-close';
import { seeded } from '../../bench/timing';

/** K = tridiag(−1, 2, −1) (fixed ends); eigenvalues 2 − 2 cos(kπ/(n+1)) with M = I (classical). */
function secondDifference(n: number): { k: SymBanded; m: SymBanded } {
  const k = createSymBanded(n, 1);
  const m = createSymBanded(n, 1);
  for (let i = 0; i < n; i++) {
    symBandedAdd(k, i, i, 2);
    if (i + 1 < n) symBandedAdd(k, i, i + 1, -1);
    symBandedAdd(m, i, i, 1);
  }
  return { k, m };
}

/** Two identical, uncoupled free–free chains: every eigenvalue is double, including two zeros. */
function twinFreeChains(half: number): { k: SymBanded; m: SymBanded } {
  const n = 2 * half;
  const k = createSymBanded(n, 1);
  const m = createSymBanded(n, 1);
  for (const off of [0, half]) {
    for (let i = 0; i < half - 1; i++) {
      symBandedAdd(k, off + i, off + i, 1);
      symBandedAdd(k, off + i + 1, off + i + 1, 1);
      symBandedAdd(k, off + i, off + i + 1, -1);
    }
  }
  for (let i = 0; i < n; i++) symBandedAdd(m, i, i, 1);
  return { k, m };
}

describe('shift-invert Lanczos on banded matrices', () => {
  it('finds the lowest eigenvalues of the second-difference matrix', () => {
    const n = 200;
    const { k, m } = secondDifference(n);
    const out = lowestModesBanded(k, m, 8);
    if (!out.ok) throw new Error(out.message);
    for (let j = 1; j <= 8; j++) {
      const exact = 2 - 2 * Math.cos((j * Math.PI) / (n + 1)); // classical closed form
      // Converged Ritz values: relative residual 1e-10 → eigenvalue error far below 1e-9.
      expectClose(out.values[j - 1], exact, { rtol: 1e-9, label: `λ${j}` });
    }
  });

  it('agrees with the dense reference on a random generalized banded problem', () => {
    const n = 60;
    const rnd = seeded(5);
    const k = createSymBanded(n, 3);
    const m = createSymBanded(n, 3);
    for (let i = 0; i < n; i++) {
      symBandedAdd(k, i, i, 3 + rnd());
      symBandedAdd(m, i, i, 2 + rnd());
      for (let d = 1; d <= 3 && i + d < n; d++) {
        symBandedAdd(k, i, i + d, 0.5 * (rnd() - 0.5));
        symBandedAdd(m, i, i + d, 0.3 * (rnd() - 0.5));
      }
    }
    const lan = lowestModesBanded(k, m, 6);
    const den = denseGeneralizedEigen(symBandedToDense(k), symBandedToDense(m), n);
    if (!lan.ok || !den.ok) throw new Error('solver failed');
    // Two independent algorithms in double precision: agreement to 1e-9 relative.
    for (let j = 0; j < 6; j++) expectClose(lan.values[j], den.values[j], { rtol: 1e-9, label: `λ${j + 1} Lanczos vs dense` });
  });

  it('returns M-orthonormal eigenvectors that satisfy K x = λ M x', () => {
    const { k, m } = secondDifference(80);
    const out = lowestModesBanded(k, m, 5);
    if (!out.ok) throw new Error(out.message);
    const n = 80;
    for (let a = 0; a < 5; a++) {
      const xa = out.vectors.subarray(a * n, (a + 1) * n);
      const kx = symBandedMul(k, xa);
      const mx = symBandedMul(m, xa);
      for (let i = 0; i < n; i++) expectClose(kx[i], out.values[a] * mx[i], { atol: 1e-9, label: `residual mode ${a} row ${i}` });
      for (let b = 0; b < 5; b++) {
        const xb = out.vectors.subarray(b * n, (b + 1) * n);
        let s = 0;
        for (let i = 0; i < n; i++) s += xb[i] * mx[i];
        // The final M-orthonormalisation of the Ritz vectors leaves orthogonality at rounding level.
        expectClose(s, a === b ? 1 : 0, { atol: 1e-10, label: `xᵀMx (${a}, ${b})` });
      }
    }
  });

  it('forms the vectors of an earlier solve correctly after later solves, and refuses them after release', () => {
    // Vectors are formed on first read from the run's basis, which later solves must not overwrite meanwhile.
    const { k, m } = secondDifference(60);
    const first = lowestModesBanded(k, m, 4);
    if (!first.ok) throw new Error(first.message);
    for (let t = 0; t < 4; t++) {
      const other = secondDifference(30 + 10 * t);
      const out = lowestModesBanded(other.k, other.m, 3);
      if (!out.ok) throw new Error(out.message);
      out.release();
    }
    const n = 60;
    for (let a = 0; a < 4; a++) {
      const x = first.vectors.subarray(a * n, (a + 1) * n);
      const kx = symBandedMul(k, x);
      const mx = symBandedMul(m, x);
      let norm = 0;
      for (let i = 0; i < n; i++) norm += x[i] * mx[i];
      // M-orthonormal to rounding (see above); the residual as tight as for a vector read at once.
      expectClose(norm, 1, { atol: 1e-10, label: `xᵀMx mode ${a + 1}` });
      for (let i = 0; i < n; i++) expectClose(kx[i], first.values[a] * mx[i], { atol: 1e-9, label: `residual mode ${a + 1} row ${i}` });
    }
    const released = lowestModesBanded(k, m, 2);
    if (!released.ok) throw new Error(released.message);
    released.release();
    expect(() => released.vectors).toThrow(/after release/);
  });

  it('finds both copies of a repeated eigenvalue, zero included', () => {
    // A single Krylov space holds one vector per eigenvalue; the copies arrive through breakdown restarts,
    // rounding, or the Sturm-count restart. Whatever the route, both copies must be returned.
    const half = 30;
    const { k, m } = twinFreeChains(half);
    const out = lowestModesBanded(k, m, 6);
    if (!out.ok) throw new Error(out.message);
    // Free chain of `half` unit masses: eigenvalues 2 − 2 cos(jπ/half), j = 0, 1, … (classical), each twice here.
    const expected = [0, 0, 1, 1, 2, 2].map((j) => 2 - 2 * Math.cos((j * Math.PI) / half));
    for (let j = 0; j < 6; j++) expectClose(out.values[j], expected[j], { rtol: 1e-8, atol: 1e-10, label: `λ${j + 1}` });
  });

  it('a Sturm count catches a copy missed by a loosely converged run, and the locked restart finds it', () => {
    // Two identical fixed–fixed chains of 100 unit masses: double eigenvalues 2 − 2cos(jπ/101) (classical).
    // With a loose Ritz tolerance the first run stops before rounding has grown the second copy
    // (seeded start vector, so this path is taken deterministically).
    const half = 100;
    const k = createSymBanded(2 * half, 1);
    const m = createSymBanded(2 * half, 1);
    for (const off of [0, half]) {
      for (let i = 0; i < half; i++) {
        symBandedAdd(k, off + i, off + i, 2);
        if (i + 1 < half) symBandedAdd(k, off + i, off + i + 1, -1);
      }
    }
    for (let i = 0; i < 2 * half; i++) symBandedAdd(m, i, i, 1);
    const out = lowestModesBanded(k, m, 4, { tolerance: 1e-4 });
    if (!out.ok) throw new Error(out.message);
    expect(out.restarts).toBeGreaterThan(0);
    const expected = [1, 1, 2, 2].map((j) => 2 - 2 * Math.cos((j * Math.PI) / (half + 1)));
    // The final Rayleigh–Ritz step squares the vector error: values far better than the 1e-4 residual tolerance.
    for (let j = 0; j < 4; j++) expectClose(out.values[j], expected[j], { rtol: 1e-8, label: `λ${j + 1}` });
  });

  it('reports a matrix that is not positive definite at the chosen shift', () => {
    const { k, m } = secondDifference(20);
    const out = lowestModesBanded(k, m, 3, { shift: 0.5 });
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.reason).toBe('not-positive-definite');
  });
});

describe('partial reorthogonalisation on a long run', () => {
  it('finds the lowest 40 eigenvalues of a 2,000-point second-difference matrix with no spurious copies', () => {
    // Forty modes need a long Krylov run, where orthogonality is lost and restored many times.
    const n = 2000;
    const { k, m } = secondDifference(n);
    const out = lowestModesBanded(k, m, 40);
    if (!out.ok) throw new Error(out.message);
    for (let j = 1; j <= 40; j++) {
      const exact = 2 - 2 * Math.cos((j * Math.PI) / (n + 1)); // classical closed form
      // Condition of this K is about 1.6e6: Ritz values carry ε·κ ≈ 4e-10 relative at worst; 1e-8 leaves room.
      expectClose(out.values[j - 1], exact, { rtol: 1e-8, label: `λ${j}` });
    }
  });
});
