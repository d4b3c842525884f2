import { describe, expect, test } from 'vitest';
import { expectClose } from '../../helpers/expect-close';
import {
  denseFromRows, denseToRows, denseZeros, matMulInto, matVec, maxAsymmetry, symmetrizeInPlace, transpose,
} from '../../../src/physics/linalg/dense';
import { createLuFactor, luFactorInto, luSolve, luSolveInto, luSolveManyInto } from '../../../src/physics/linalg/lu';
import { symmetricEigenvalues } from '../../../src/physics/linalg/jacobi-eigen';
import { seededUniform01 } from '../../../src/physics/linalg/seeded';

/** Seeded generator so the random systems repeat. */
const seeded = seededUniform01;

function randomMatrix(n: number, rnd: () => number) {
  const m = denseZeros(n, n);
  for (let i = 0; i < n * n; i++) m.data[i] = 2 * rnd() - 1;
  return m;
}

describe('dense matrices', () => {
  test('rows round-trip and matrix–vector product match a hand computation', () => {
    const a = denseFromRows([[1, 2], [3, 4], [5, 6]]);
    expect(denseToRows(a)).toEqual([[1, 2], [3, 4], [5, 6]]);
    expect(Array.from(matVec(a, Float64Array.from([1, -1])))).toEqual([-1, -1, -1]);
  });

  test('matrix product with the transpose is symmetric', () => {
    const a = randomMatrix(7, seeded(3));
    const p = denseZeros(7, 7);
    matMulInto(a, transpose(a), p);
    // Each entry is the same dot product summed in the same order: exactly symmetric.
    expect(maxAsymmetry(p)).toBe(0);
  });

  test('symmetrising removes the asymmetry and keeps the mean of each pair', () => {
    const a = denseFromRows([[1, 2], [4, 3]]);
    expect(maxAsymmetry(a)).toBe(2);
    symmetrizeInPlace(a);
    expect(denseToRows(a)).toEqual([[1, 3], [3, 3]]);
  });

  test('mismatched shapes are rejected with both shapes in the message', () => {
    expect(() => matMulInto(denseZeros(2, 3), denseZeros(2, 3), denseZeros(2, 3))).toThrow(/2×3 · 2×3/);
  });
});

describe('LU factorisation with partial pivoting', () => {
  test('solves random systems to round-off (residual relative to |A||x|)', () => {
    const rnd = seeded(11);
    for (const n of [1, 2, 5, 17, 64, 131]) {
      const a = randomMatrix(n, rnd);
      const x = Float64Array.from({ length: n }, () => rnd() - 0.5);
      const b = matVec(a, x);
      const r = luSolve(a, b);
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      let err = 0;
      let scale = 0;
      for (let i = 0; i < n; i++) {
        err = Math.max(err, Math.abs(r.x[i] - x[i]));
        scale = Math.max(scale, Math.abs(x[i]));
      }
      // Random matrices of this size have condition numbers ~1e2–1e4: 1e-9 leaves a wide margin over
      // double round-off (common practice, no source).
      expectClose(err / scale, 0, { atol: 1e-9, label: `max error of the LU solution, n = ${n}` });
    }
  });

  test('needs pivoting: a zero on the diagonal is handled', () => {
    const a = denseFromRows([[0, 1], [1, 0]]);
    const r = luSolve(a, Float64Array.from([2, 3]));
    expect(r.ok && Array.from(r.x)).toEqual([3, 2]);
  });

  test('a singular matrix is reported with the failing column, not divided by zero', () => {
    const a = denseFromRows([[1, 2, 3], [2, 4, 6], [1, 0, 1]]);
    const f = createLuFactor(3);
    const out = luFactorInto(a, f);
    expect(out.ok).toBe(false);
    if (!out.ok) {
      expect(out.reason).toBe('singular');
      expect(out.column).toBeGreaterThanOrEqual(1);
    }
  });

  test('several right-hand sides in one buffer give the same answers as one at a time', () => {
    const rnd = seeded(5);
    const n = 9;
    const a = randomMatrix(n, rnd);
    const f = createLuFactor(n);
    expect(luFactorInto(a, f).ok).toBe(true);
    const b = Float64Array.from({ length: 3 * n }, () => rnd());
    const many = luSolveManyInto(f, b, 3, new Float64Array(3 * n));
    for (let c = 0; c < 3; c++) {
      const one = luSolveInto(f, b.subarray(c * n, (c + 1) * n), new Float64Array(n));
      for (let i = 0; i < n; i++) expect(many[c * n + i]).toBe(one[i]);
    }
  });

  test('many right-hand sides solved together (groups of four and a remainder, or fewer than four, in place) match one at a time bit for bit', () => {
    // Cross-check: the blocked multi-column substitution against the one-column one; same operations in the
    // same order per column, so the answers must be identical, not merely close.
    const rnd = seeded(11);
    const n = 130;
    const a = randomMatrix(n, rnd);
    const f = createLuFactor(n);
    expect(luFactorInto(a, f).ok).toBe(true);
    for (const m of [12, 7, 3]) {
      const b = Float64Array.from({ length: m * n }, () => rnd() - 0.5);
      const ones = Array.from({ length: m }, (_, c) => luSolveInto(f, b.subarray(c * n, (c + 1) * n), new Float64Array(n)));
      luSolveManyInto(f, b, m, b);
      for (let c = 0; c < m; c++) for (let i = 0; i < n; i++) expect(b[c * n + i]).toBe(ones[c][i]);
    }
  });

  test('solving in place (output aliasing the right-hand side) gives the same answer', () => {
    const a = denseFromRows([[4, 1, 0], [1, 3, 1], [0, 1, 2]]);
    const f = createLuFactor(3);
    luFactorInto(a, f);
    const b = Float64Array.from([1, 2, 3]);
    const copy = luSolveInto(f, b, new Float64Array(3));
    luSolveInto(f, b, b);
    expect(Array.from(b)).toEqual(Array.from(copy));
  });
});

describe('symmetric eigenvalues by Jacobi rotations', () => {
  test('eigenvalues of a 2×2 matrix match the closed form', () => {
    // [[2, 1], [1, 2]] has eigenvalues 1 and 3 (classical).
    const ev = symmetricEigenvalues(Float64Array.from([2, 1, 1, 2]), 2);
    expectClose(ev[0], 1, { rtol: 1e-14, label: 'smaller eigenvalue' });
    expectClose(ev[1], 3, { rtol: 1e-14, label: 'larger eigenvalue' });
  });

  test('trace and determinant are preserved for a random symmetric matrix', () => {
    const rnd = seeded(21);
    const n = 6;
    const a = new Float64Array(n * n);
    for (let i = 0; i < n; i++) for (let j = i; j < n; j++) a[i * n + j] = a[j * n + i] = rnd() - 0.5;
    const ev = symmetricEigenvalues(a, n);
    let trace = 0;
    for (let i = 0; i < n; i++) trace += a[i * n + i];
    // Sum of eigenvalues equals the trace (classical); round-off only.
    expectClose(ev.reduce((s, v) => s + v, 0), trace, { atol: 1e-12, label: 'sum of eigenvalues vs trace' });
    for (let i = 1; i < n; i++) expect(ev[i]).toBeGreaterThanOrEqual(ev[i - 1]);
    // Determinant from LU (product of pivots with the permutation sign) equals the product of eigenvalues.
    const f = createLuFactor(n);
    luFactorInto(a, f);
    let det = 1;
    for (let i = 0; i < n; i++) det *= f.lu[i * n + i];
    const p = Array.from(f.perm);
    let sign = 1;
    for (let i = 0; i < n; i++) {
      while (p[i] !== i) {
        const j = p[i];
        [p[i], p[j]] = [p[j], p[i]];
        sign = -sign;
      }
    }
    expectClose(sign * det, ev.reduce((s, v) => s * v, 1), { rtol: 1e-10, label: 'determinant vs product of eigenvalues' });
  });
});
