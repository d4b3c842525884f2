/**
 * Symmetric banded matrices, the storage used for beam stiffness and mass matrices.
 * A beam with two degrees of freedom per node (lateral displacement w, rotation θ) couples
 * each node only with its neighbours, so the half-bandwidth is 3 whatever the mesh size.
 */

/**
 * Symmetric n×n matrix with half-bandwidth b (entries with |i − j| > b are zero).
 * Layout: the upper band stored row by row, `b + 1` slots per row:
 * entry (i, j), 0 ≤ j − i ≤ b, lives at `data[i·(b + 1) + (j − i)]`; slot 0 of each row is the diagonal.
 * Slots that would fall past the last column (i + k ≥ n) stay zero.
 */
export interface SymBanded {
  n: number;
  halfBandwidth: number;
  data: Float64Array;
}

export function createSymBanded(n: number, halfBandwidth: number): SymBanded {
  return { n, halfBandwidth, data: new Float64Array(n * (halfBandwidth + 1)) };
}

/** Reads entry (i, j) of a symmetric banded matrix (zero outside the band). */
export function symBandedGet(a: SymBanded, i: number, j: number): number {
  const lo = i < j ? i : j;
  const k = Math.abs(i - j);
  if (k > a.halfBandwidth) return 0;
  return a.data[lo * (a.halfBandwidth + 1) + k];
}

/**
 * Adds v to entry (i, j) and, by symmetry, to (j, i): the stored slot is touched once.
 * Assembly calls it only for i ≤ j with j − i ≤ b.
 */
export function symBandedAdd(a: SymBanded, i: number, j: number, v: number): void {
  const lo = i < j ? i : j;
  const k = Math.abs(i - j);
  if (k > a.halfBandwidth) throw new RangeError(`entry (${i}, ${j}) lies outside half-bandwidth ${a.halfBandwidth}`);
  a.data[lo * (a.halfBandwidth + 1) + k] += v;
}

/** out = A x. */
export function symBandedMulInto(a: SymBanded, x: Float64Array, out: Float64Array): Float64Array {
  const { n, halfBandwidth: b, data } = a;
  const w = b + 1;
  out.fill(0, 0, n);
  // Half-bandwidth 3 (every beam matrix): the loop over the band written out, same operations in the same order.
  const full = b === 3 ? n - 3 : 0;
  for (let i = 0; i < n; i++) {
    const row = i * w;
    const xi = x[i];
    let s = data[row] * xi;
    if (i < full) {
      const v1 = data[row + 1];
      s += v1 * x[i + 1];
      out[i + 1] += v1 * xi;
      const v2 = data[row + 2];
      s += v2 * x[i + 2];
      out[i + 2] += v2 * xi;
      const v3 = data[row + 3];
      s += v3 * x[i + 3];
      out[i + 3] += v3 * xi;
    } else {
      const kmax = Math.min(b, n - 1 - i);
      for (let k = 1; k <= kmax; k++) {
        const v = data[row + k];
        s += v * x[i + k];
        out[i + k] += v * xi;
      }
    }
    out[i] += s;
  }
  return out;
}

export function symBandedMul(a: SymBanded, x: Float64Array): Float64Array {
  return symBandedMulInto(a, x, new Float64Array(a.n));
}

/** out = α A + β B, all three with the same size and half-bandwidth. */
export function symBandedCombineInto(alpha: number, a: SymBanded, beta: number, b: SymBanded, out: SymBanded): SymBanded {
  if (a.n !== b.n || a.n !== out.n || a.halfBandwidth !== b.halfBandwidth || a.halfBandwidth !== out.halfBandwidth) {
    throw new RangeError('symBandedCombineInto: matrices differ in size or half-bandwidth');
  }
  const ad = a.data;
  const bd = b.data;
  const od = out.data;
  for (let i = 0; i < od.length; i++) od[i] = alpha * ad[i] + beta * bd[i];
  return out;
}

/** Full dense copy, row-major n×n (for tests and the dense reference solver). */
export function symBandedToDense(a: SymBanded): Float64Array {
  const { n, halfBandwidth: b, data } = a;
  const out = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const kmax = Math.min(b, n - 1 - i);
    for (let k = 0; k <= kmax; k++) {
      const v = data[i * (b + 1) + k];
      out[i * n + i + k] = v;
      out[(i + k) * n + i] = v;
    }
  }
  return out;
}
