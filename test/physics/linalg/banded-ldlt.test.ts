import { describe, expect, it } from 'vitest';
import { createSymBanded, symBandedAdd, symBandedMul, symBandedToDense, type SymBanded } from '../../../src/physics/linalg/banded';
import { factorLdlt, solveLdlt } from '../../../src/physics/linalg/banded-ldlt';
import { denseSymmetricEigen } from '../../../src/physics/linalg/eigen-dense';
import { expectClose } from '../../helpers/expect-close';
import { seeded } from '../../bench/timing';

/** Random symmetric banded matrix with a chosen diagonal shift (shift large → positive definite). */
function randomBanded(n: number, b: number, diagShift: number, seed: number): SymBanded {
  const rnd = seeded(seed);
  const a = createSymBanded(n, b);
  for (let i = 0; i < n; i++) {
    symBandedAdd(a, i, i, diagShift + rnd());
    for (let k = 1; k <= b && i + k < n; k++) symBandedAdd(a, i, i + k, rnd() - 0.5);
  }
  return a;
}

describe('banded storage and LDLᵀ', () => {
  it('banded product equals the dense product', () => {
    const a = randomBanded(17, 3, 1, 7);
    const dense = symBandedToDense(a);
    const x = Float64Array.from({ length: 17 }, (_, i) => Math.sin(i + 1));
    const y = symBandedMul(a, x);
    for (let i = 0; i < 17; i++) {
      let s = 0;
      for (let j = 0; j < 17; j++) s += dense[i * 17 + j] * x[j];
      // Same sums in a different order: rounding only.
      expectClose(y[i], s, { rtol: 1e-13, atol: 1e-14, label: `row ${i}` });
    }
  });

  it('solve reproduces the right-hand side of a positive definite system', () => {
    const a = randomBanded(40, 3, 4, 3);
    const f = factorLdlt(a);
    expect(f.negativePivots).toBe(0);
    const rhs = Float64Array.from({ length: 40 }, (_, i) => Math.cos(3 * i));
    const x = solveLdlt(f, rhs);
    const back = symBandedMul(a, x);
    // Diagonally dominant system, condition number O(10): residual at rounding level.
    for (let i = 0; i < 40; i++) expectClose(back[i], rhs[i], { atol: 1e-12, label: `residual row ${i}` });
  });

  it('negative pivot count equals the number of negative eigenvalues (Sylvester inertia)', () => {
    // Classical: Sylvester's law of inertia. Compared with a dense eigen-decomposition.
    for (const shift of [-1.2, -0.4, 0, 0.3, 0.9]) {
      const a = randomBanded(30, 2, shift, 11);
      const eig = denseSymmetricEigen(symBandedToDense(a), 30);
      if (!eig.ok) throw new Error('dense eigen failed');
      const negatives = Array.from(eig.values).filter((v) => v < 0).length;
      expect(factorLdlt(a).negativePivots).toBe(negatives);
    }
  });

  it('a singular matrix shows a near-zero pivot ratio', () => {
    // Free–free chain Laplacian: rows sum to zero, so it is singular (classical).
    const n = 12;
    const a = createSymBanded(n, 1);
    for (let i = 0; i < n - 1; i++) {
      symBandedAdd(a, i, i, 1);
      symBandedAdd(a, i + 1, i + 1, 1);
      symBandedAdd(a, i, i + 1, -1);
    }
    expect(factorLdlt(a).smallestPivotRatio).toBeLessThan(1e-13);
  });
});
