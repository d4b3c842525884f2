/**
 * Dense square/rectangular matrices stored row-major in one flat Float64Array.
 *
 * Layout: element (i, j) of an `rows × cols` matrix is `data[i * cols + j]`. Row-major so that the
 * inner loops of LU elimination and matrix–vector products run over contiguous memory.
 */

/** Row-major dense matrix: `data[i * cols + j]` is element (i, j). */
export interface DenseMatrix {
  rows: number;
  cols: number;
  data: Float64Array;
}

/** A zero matrix of the given size. */
export function denseZeros(rows: number, cols: number): DenseMatrix {
  return { rows, cols, data: new Float64Array(rows * cols) };
}

/** Builds a matrix from nested arrays (tests, small inputs). */
export function denseFromRows(rows: readonly (readonly number[])[]): DenseMatrix {
  const r = rows.length;
  const c = r === 0 ? 0 : rows[0].length;
  const m = denseZeros(r, c);
  for (let i = 0; i < r; i++) {
    if (rows[i].length !== c) throw new RangeError(`row ${i} has ${rows[i].length} entries, expected ${c}`);
    for (let j = 0; j < c; j++) m.data[i * c + j] = rows[i][j];
  }
  return m;
}

/** Nested arrays from a matrix (results, JSON). */
export function denseToRows(m: DenseMatrix): number[][] {
  const out: number[][] = [];
  for (let i = 0; i < m.rows; i++) out.push(Array.from(m.data.subarray(i * m.cols, (i + 1) * m.cols)));
  return out;
}

/** out = A x (out must not alias x). */
export function matVecInto(a: DenseMatrix, x: Float64Array, out: Float64Array): Float64Array {
  const { rows, cols, data } = a;
  for (let i = 0; i < rows; i++) {
    let s = 0;
    const o = i * cols;
    for (let j = 0; j < cols; j++) s += data[o + j] * x[j];
    out[i] = s;
  }
  return out;
}

/** Allocating wrapper of `matVecInto`. */
export function matVec(a: DenseMatrix, x: Float64Array): Float64Array {
  return matVecInto(a, x, new Float64Array(a.rows));
}

/** out = A B for row-major A (m×k) and B (k×n); `out` must not alias A or B. */
export function matMulInto(a: DenseMatrix, b: DenseMatrix, out: DenseMatrix): DenseMatrix {
  if (a.cols !== b.rows || out.rows !== a.rows || out.cols !== b.cols) {
    throw new RangeError(`matMul: shapes ${a.rows}×${a.cols} · ${b.rows}×${b.cols} -> ${out.rows}×${out.cols} do not match`);
  }
  const n = b.cols;
  const od = out.data;
  od.fill(0);
  // i-k-j order: the inner loop streams rows of B and of the output.
  for (let i = 0; i < a.rows; i++) {
    const oi = i * n;
    for (let k = 0; k < a.cols; k++) {
      const aik = a.data[i * a.cols + k];
      if (aik === 0) continue;
      const bk = k * n;
      for (let j = 0; j < n; j++) od[oi + j] += aik * b.data[bk + j];
    }
  }
  return out;
}

/** Transpose into a new matrix. */
export function transpose(a: DenseMatrix): DenseMatrix {
  const t = denseZeros(a.cols, a.rows);
  for (let i = 0; i < a.rows; i++) for (let j = 0; j < a.cols; j++) t.data[j * a.rows + i] = a.data[i * a.cols + j];
  return t;
}

/** Largest |a_ij − a_ji| of a square matrix (0 when symmetric). */
export function maxAsymmetry(a: DenseMatrix): number {
  let m = 0;
  for (let i = 0; i < a.rows; i++) {
    for (let j = i + 1; j < a.cols; j++) {
      const d = Math.abs(a.data[i * a.cols + j] - a.data[j * a.cols + i]);
      if (d > m) m = d;
    }
  }
  return m;
}

/** Replaces a square matrix by (A + Aᵀ)/2 in place. */
export function symmetrizeInPlace(a: DenseMatrix): DenseMatrix {
  const n = a.rows;
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      const v = 0.5 * (a.data[i * n + j] + a.data[j * n + i]);
      a.data[i * n + j] = v;
      a.data[j * n + i] = v;
    }
  }
  return a;
}
