import { describe, it } from 'vitest';
import { denseGeneralizedEigen, denseSymmetricEigen } from '../../../src/physics/linalg/eigen-dense';
import { expectClose } from '../../helpers/expect-close';
import { seeded } from '../../bench/timing';

describe('dense reference eigen-solver', () => {
  it('reproduces the spectrum of the second-difference matrix', () => {
    const n = 25;
    const a = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      a[i * n + i] = 2;
      if (i + 1 < n) {
        a[i * n + i + 1] = -1;
        a[(i + 1) * n + i] = -1;
      }
    }
    const out = denseSymmetricEigen(a, n);
    if (!out.ok) throw new Error('failed');
    for (let j = 1; j <= n; j++) {
      // Classical closed form 2 − 2cos(jπ/(n+1)); rounding only.
      expectClose(out.values[j - 1], 2 - 2 * Math.cos((j * Math.PI) / (n + 1)), { atol: 1e-13, label: `λ${j}` });
    }
  });

  it('gives M-orthonormal vectors with small residuals for a random generalized problem', () => {
    const n = 30;
    const rnd = seeded(9);
    const k = new Float64Array(n * n);
    const m = new Float64Array(n * n);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j <= i; j++) {
        const kv = rnd() - 0.5;
        const mv = 0.2 * (rnd() - 0.5);
        k[i * n + j] = k[j * n + i] = kv;
        m[i * n + j] = m[j * n + i] = mv;
      }
      k[i * n + i] += 5;
      m[i * n + i] += 3;
    }
    const out = denseGeneralizedEigen(k, m, n);
    if (!out.ok) throw new Error(out.message);
    for (let a = 0; a < n; a += 7) {
      const x = out.vectors.subarray(a * n, (a + 1) * n);
      for (let i = 0; i < n; i++) {
        let kx = 0;
        let mx = 0;
        for (let j = 0; j < n; j++) {
          kx += k[i * n + j] * x[j];
          mx += m[i * n + j] * x[j];
        }
        // Well-conditioned O(1) matrices: residual at rounding level.
        expectClose(kx, out.values[a] * mx, { atol: 1e-11, label: `residual mode ${a} row ${i}` });
      }
      for (let b = 0; b < n; b += 5) {
        let s = 0;
        for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) s += out.vectors[b * n + i] * m[i * n + j] * x[j];
        expectClose(s, a === b ? 1 : 0, { atol: 1e-11, label: `xᵀMx (${a}, ${b})` });
      }
    }
  });
});
