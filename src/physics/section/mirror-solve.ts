/**
 * The boundary-element system of a mirror-symmetric section (mirror.ts) solved as its two halves.
 *
 * With σ the panel reflection and Π its permutation, A commutes with Π, so A maps vectors with
 * x_σ(j) = x_j (symmetric) to symmetric ones and vectors with x_σ(j) = −x_j (antisymmetric) to
 * antisymmetric ones. Splitting each right-hand side b = b_s + b_a, b_s = (b + Πb)/2, gives two systems
 * on the representative panels H (one of each mirror pair, j < σ(j)) and the self-mirrored panels S:
 *   symmetric, rows i ∈ H ∪ S:  Σ_{j∈H} (A_ij + A_iσ(j)) x_j + Σ_{j∈S} A_ij x_j = b_s,i,
 *   antisymmetric, rows i ∈ H:  Σ_{j∈H} (A_ij − A_iσ(j)) x_j = b_a,i   (x_j = 0 on S),
 * and x = x_s + x_a on H, x_s − x_a on their mirrors. Only the rows of H ∪ S are assembled (about half),
 * and each half is factored on its own (two orders of n/2: a quarter of the work of one order n).
 *
 * Layout: x as in solve-level.ts, motion c at `x[c·n … (c+1)·n)`.
 */
import { luFactorInPlace, luSolveManyInto, type LuFactor } from '../linalg/lu';
import { assembleRow, type RowAssembly } from './assemble';

export type HalfOutcome = { ok: true } | { ok: false; column: number };

/**
 * Assembles and solves for all 3K motions into `x`. `workspace(order, slot)` lends the LU workspaces of the
 * two halves (slots 0 and 1). A singular half reports the panel of its pivot column.
 */
export function solveMirrored(
  ra: RowAssembly,
  mirror: Int32Array,
  x: Float64Array,
  workspace: (order: number, slot: number) => LuFactor,
): HalfOutcome {
  const n = ra.P.count;
  const m3 = 3 * ra.bodyCount;
  // Representatives in panel order: the symmetric half's unknowns are `rows`, the antisymmetric half's
  // those of them that are not their own mirror.
  const rows: number[] = [];
  const pairRows: number[] = [];
  for (let j = 0; j < n; j++) {
    if (mirror[j] < j) continue;
    rows.push(j);
    if (mirror[j] !== j) pairRows.push(j);
  }
  const ns = rows.length;
  const na = pairRows.length;
  // Both halves are folded straight into their LU workspaces, row by row as the rows are assembled.
  const sym = workspace(ns, 0);
  const anti = workspace(na, 1);
  const as = sym.lu;
  const aa = anti.lu;
  const bs = new Float64Array(m3 * ns);
  const ba = new Float64Array(m3 * na);
  const row = new Float64Array(n);
  const acc = new Float64Array(m3);
  const accMirror = new Float64Array(m3);
  for (let r = 0, ra2 = 0; r < ns; r++) {
    const i = rows[r];
    assembleRow(ra, i, row, 0, acc, mirror, accMirror);
    const symRow = r * ns;
    for (let c = 0; c < ns; c++) {
      const j = rows[c];
      const js = mirror[j];
      as[symRow + c] = js === j ? row[j] : row[j] + row[js];
    }
    for (let c = 0; c < m3; c++) bs[c * ns + r] = 0.5 * (acc[c] + accMirror[c]);
    if (mirror[i] === i) continue;
    const antiRow = ra2 * na;
    for (let c = 0; c < na; c++) {
      const j = pairRows[c];
      aa[antiRow + c] = row[j] - row[mirror[j]];
    }
    for (let c = 0; c < m3; c++) ba[c * na + ra2] = 0.5 * (acc[c] - accMirror[c]);
    ra2++;
  }
  const xs = solveHalf(sym, bs, m3);
  if (!xs.ok) return { ok: false, column: rows[xs.column] };
  const xa = na > 0 ? solveHalf(anti, ba, m3) : { ok: true as const, x: new Float64Array(0) };
  if (!xa.ok) return { ok: false, column: pairRows[xa.column] };
  for (let c = 0; c < m3; c++) {
    const col = c * n;
    for (let r = 0, r2 = 0; r < ns; r++) {
      const j = rows[r];
      const js = mirror[j];
      const s = xs.x[c * ns + r];
      if (js === j) {
        x[col + j] = s;
        continue;
      }
      const t = xa.x[c * na + r2++];
      x[col + j] = s + t;
      x[col + js] = s - t;
    }
  }
  return { ok: true };
}

/** Factors the half already in `lu` and solves its m right-hand sides (column-wise in `b`). */
function solveHalf(lu: LuFactor, b: Float64Array, m: number): { ok: true; x: Float64Array } | { ok: false; column: number } {
  const f = luFactorInPlace(lu);
  if (!f.ok) return { ok: false, column: f.column };
  const x = new Float64Array(m * lu.n);
  luSolveManyInto(lu, b, m, x);
  return { ok: true, x };
}
