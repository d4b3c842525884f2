"""Times SciPy's routes to the lowest 10 eigenpairs on the member bench's own matrices, beside Wetmode's.

Not part of `npm test` or `npm run bench` (it needs Python with NumPy and SciPy). Usage:
    npm run build && npx vite build --config vite.bench.config.ts
    WETMODE_EIGEN_DUMP=/tmp/wetmode-eigen WETMODE_BENCH=member node dist-bench/run.js
    OPENBLAS_NUM_THREADS=1 python3 test/tools/eigen-vs-scipy.py /tmp/wetmode-eigen
It prints each route's median and best time and its largest relative frequency error against the Rayleigh
quotient of an accurate eigenvector summed in extended precision (numpy.longdouble), which is exact to the
square of the vector's error.
"""
import json
import sys
import time

import numpy as np
import scipy
import scipy.linalg as la
import scipy.sparse as sp
from scipy.sparse.linalg import LinearOperator, eigsh


def load(path):
    d = json.load(open(path))
    n, b = d['n'], d['halfBandwidth']

    def full(data):
        rows = np.array(data).reshape(n, b + 1)
        a = np.zeros((n, n))
        for k in range(b + 1):
            v = rows[: n - k, k]
            a[np.arange(n - k), np.arange(k, n)] = v
            a[np.arange(k, n), np.arange(n - k)] = v
        return a

    return n, b, full(d['k']), full(d['m']), np.array(d['wetmode'])


def timed(f, reps):
    ts, out = [], None
    for _ in range(reps):
        t = time.perf_counter()
        out = f()
        ts.append(time.perf_counter() - t)
    return 1e3 * float(np.median(ts)), 1e3 * min(ts), out


def main(folder):
    print(f'SciPy {scipy.__version__}, NumPy {np.__version__}; one BLAS thread recommended (OPENBLAS_NUM_THREADS=1)')
    for name, reps in (('member-200', 50), ('member-1000', 30)):
        n, b, K, M, ours = load(f'{folder}/{name}.json')
        Ks, Ms = sp.csc_matrix(K), sp.csc_matrix(M)
        upper = np.zeros((b + 1, n))
        for k in range(b + 1):
            upper[b - k, k:] = np.diag(K, k)

        def superlu():
            return eigsh(Ks, k=10, M=Ms, sigma=0, which='LM')

        def banded_cholesky():
            c = la.cholesky_banded(upper)
            op = LinearOperator((n, n), matvec=lambda x: la.cho_solve_banded((c, False), x))
            return eigsh(Ks, k=10, M=Ms, sigma=0, which='LM', OPinv=op)

        # Reference: accurate vectors, then Rayleigh quotients in extended precision.
        vals, vecs = eigsh(Ks, k=10, M=Ms, sigma=0, which='LM', tol=1e-14)
        order = np.argsort(vals)
        KL, ML = K.astype(np.longdouble), M.astype(np.longdouble)
        ref = np.array([(x @ (KL @ x)) / (x @ (ML @ x)) for x in (vecs[:, i].astype(np.longdouble) for i in order)])

        def err(values):
            f = np.sqrt(np.sort(np.asarray(values, dtype=np.longdouble)))
            return float(np.max(np.abs(f - np.sqrt(ref)) / np.sqrt(ref)))

        print(f'{name}: {n} DOFs, half-bandwidth {b}')
        for label, f in (('eigsh shift-invert (ARPACK), SuperLU', superlu), ('eigsh shift-invert (ARPACK), banded Cholesky', banded_cholesky)):
            med, best, out = timed(f, reps)
            print(f'  {label:46s} median {med:7.3f} ms  best {best:7.3f} ms  max rel. frequency error {err(out[0]):.1e}')
        print(f'  {"Wetmode (see the member bench for its times)":46s} {"":37s}max rel. frequency error {err(ours):.1e}')


if __name__ == '__main__':
    main(sys.argv[1] if len(sys.argv) > 1 else '/tmp/wetmode-eigen')
