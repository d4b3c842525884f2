/** The blocked LU factor (used from order 96 on) against the unblocked one and against systems with known solutions. */
import { describe, expect, test } from 'vitest';
import { expectClose } from '../../helpers/expect-close';
import { createLuFactor, luFactorInPlace, luFactorInPlaceUnblocked, luSolveInto } from '../../../src/physics/linalg/lu';
import { seededUniform01 } from '../../../src/physics/linalg/seeded';

function randomSystem(n: number, seed: number): Float64Array {
  const rnd = seededUniform01(seed);
  const a = new Float64Array(n * n);
  for (let i = 0; i < n * n; i++) a[i] = 2 * rnd() - 1;
  return a;
}

describe('blocked LU with partial pivoting', () => {
  test.each([96, 131, 200, 257])('order %s: same pivots as the unblocked factor and the same factors to round-off', (n) => {
    const a = randomSystem(n, n);
    const blocked = createLuFactor(n);
    const plain = createLuFactor(n);
    blocked.lu.set(a);
    plain.lu.set(a);
    expect(luFactorInPlace(blocked).ok).toBe(true);
    expect(luFactorInPlaceUnblocked(plain).ok).toBe(true);
    // Partial pivoting picks the same rows unless two candidates tie to round-off (not for random entries).
    expect(Array.from(blocked.perm)).toEqual(Array.from(plain.perm));
    let worst = 0;
    let big = 0;
    for (let i = 0; i < n * n; i++) {
      worst = Math.max(worst, Math.abs(blocked.lu[i] - plain.lu[i]));
      big = Math.max(big, Math.abs(plain.lu[i]));
    }
    // The same sums in another order: differences of a few hundred ulps of the largest factor entry.
    expect(worst).toBeLessThan(1e-11 * big);
  });

  test('random system of order 300 with a known solution: x recovered to 1e-10 (cross-check, b = A x)', () => {
    const n = 300;
    const a = randomSystem(n, 11);
    const x = new Float64Array(n).map((_, i) => Math.sin(i + 1));
    const b = new Float64Array(n);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) b[i] += a[i * n + j] * x[j];
    const f = createLuFactor(n);
    f.lu.set(a);
    expect(luFactorInPlace(f).ok).toBe(true);
    const got = luSolveInto(f, b, new Float64Array(n));
    // Random dense matrices of this order have condition numbers of 1e3–1e4: 1e-10 leaves room.
    for (let i = 0; i < n; i += 37) expectClose(got[i], x[i], { atol: 1e-10, label: `x[${i}]` });
  });

  test('second-difference matrix tridiag(−1, 2, −1) of order 150, right side all ones: x_i = i (n + 1 − i) / 2 (classical)', () => {
    // Classical: the discrete Poisson problem −x_{i−1} + 2x_i − x_{i+1} = 1, x_0 = x_{n+1} = 0, solved by the parabola.
    const n = 150;
    const f = createLuFactor(n);
    for (let i = 0; i < n; i++) {
      f.lu[i * n + i] = 2;
      if (i > 0) f.lu[i * n + i - 1] = -1;
      if (i + 1 < n) f.lu[i * n + i + 1] = -1;
    }
    expect(luFactorInPlace(f).ok).toBe(true);
    const x = luSolveInto(f, new Float64Array(n).fill(1), new Float64Array(n));
    // Condition number ~4n²/π² ≈ 9e3 and |x| up to 2.8e3: 1e-8 relative is round-off with margin.
    for (const i of [1, 17, 75, 150]) expectClose(x[i - 1], (i * (n + 1 - i)) / 2, { rtol: 1e-8, label: `x_${i}` });
  });

  test('a singular matrix of order 128 (two equal rows) is reported, with the column where elimination fails', () => {
    const n = 128;
    const a = randomSystem(n, 5);
    for (let j = 0; j < n; j++) a[70 * n + j] = a[3 * n + j];
    const f = createLuFactor(n);
    f.lu.set(a);
    const out = luFactorInPlace(f);
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.column).toBe(n - 1);
  });
});
