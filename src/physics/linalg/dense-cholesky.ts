/**
 * Small dense Cholesky factorisation A = L Lᵀ (row-major, lower triangle overwritten) and solves with it
 * (G.H. Golub & C.F. Van Loan, Matrix Computations, §4.2). For the plate's small Gram and gap matrices.
 */

/** In place; false if a pivot falls to or below `relTol` times its original diagonal (not positive definite). */
export function choleskyInPlace(a: Float64Array, n: number, relTol = 0): boolean {
  for (let j = 0; j < n; j++) {
    let d = a[j * n + j];
    const original = d;
    for (let k = 0; k < j; k++) d -= a[j * n + k] ** 2;
    if (!(d > relTol * original)) return false;
    const l = Math.sqrt(d);
    a[j * n + j] = l;
    for (let i = j + 1; i < n; i++) {
      let t = a[i * n + j];
      for (let k = 0; k < j; k++) t -= a[i * n + k] * a[j * n + k];
      a[i * n + j] = t / l;
    }
  }
  return true;
}

/** Solves L Lᵀ X = B in place for `cols` right-hand sides (B row-major n × cols), L from `choleskyInPlace`. */
export function choleskySolveInPlace(l: Float64Array, n: number, b: Float64Array, cols: number): void {
  for (let c = 0; c < cols; c++) {
    for (let i = 0; i < n; i++) {
      let t = b[i * cols + c];
      for (let k = 0; k < i; k++) t -= l[i * n + k] * b[k * cols + c];
      b[i * cols + c] = t / l[i * n + i];
    }
    for (let i = n - 1; i >= 0; i--) {
      let t = b[i * cols + c];
      for (let k = i + 1; k < n; k++) t -= l[k * n + i] * b[k * cols + c];
      b[i * cols + c] = t / l[i * n + i];
    }
  }
}
