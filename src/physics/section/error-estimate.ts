/**
 * Richardson error estimate of the diagonal added-mass terms from three nested resolutions (h, h/2, h/4:
 * the coarser meshes are every other node of the finer), and which terms may be reported extrapolated.
 *
 * The observed order p = log2((m_{h} − m_{h/2}) / (m_{h/2} − m_{h/4})) is bounded to [1, 2] (p = 1 when the
 * sequence is not monotone) and the estimate of the finest value's error is |m_fine − m_extrapolated| =
 * |m_fine − m_coarse| / (2^p − 1) (L.F. Richardson & J.A. Gaunt, "The deferred approach to the limit",
 * Phil. Trans. R. Soc. A 226 (1927) 299). Below the asymptotic order (ASYMPTOTIC_ORDER) or when a body's mean panel is
 * longer than its clearance to another outline, the estimate is widened to the whole change from the
 * coarsest level, max(|m_fine − m_coarsest|, |m_fine − m_coarse|), which brackets the true error there
 * (measured against Fritz's closed form for annulus gaps down to 1 %). Bounding p by 2 keeps the estimate
 * conservative for circles (observed p ≈ 3); the lower bound 1 covers thin plates (p ≈ 1.2).
 */
import type { ErrorEstimate, SectionDof } from './types';
import type { SectionModel } from './model';
import type { LevelSolution } from './solve-level';
import { bodyClearances } from './clearance';

/**
 * Observed order below which the three levels are taken to be outside the asymptotic range. Smooth
 * outlines and graded corners converge at 1.9–3; a 1 % annulus gap at 64–512 panels shows 0.5–1.6 while
 * its error is still several times the Richardson difference (measured against Fritz's closed form), and
 * a rectangle of a/b = 0.1 shows 1.65 at 128 panels with its extrapolation still 0.14 % off.
 */
export const ASYMPTOTIC_ORDER = 1.8;

const DOFS: SectionDof[] = ['x', 'y', 'rotation'];

export interface LevelEstimate {
  errorEstimates: ErrorEstimate[];
  /** Per term: order to extrapolate with (observed, within [ASYMPTOTIC_ORDER, 3.5]) where `extrapolate` is 1. */
  orders: Float64Array;
  extrapolate: Uint8Array;
}

/** `clearance`: per body, from `bodyClearances(model)` (computed once per model by the caller when omitted here). */
export function estimateErrors(
  model: SectionModel,
  fine: LevelSolution,
  coarse: LevelSolution,
  coarsest: LevelSolution | null,
  rho: number,
  clearance: readonly number[] = bodyClearances(model),
): LevelEstimate {
  const K = model.refX.length;
  const m3 = 3 * K;
  const errorEstimates: ErrorEstimate[] = [];
  const orders = new Float64Array(m3);
  const extrapolate = new Uint8Array(m3);
  // Mean fine panel length per body against its clearance: panels longer than the gap are pre-asymptotic.
  const panelLength = new Float64Array(K);
  const panelCount = new Float64Array(K);
  for (let j = 0; j < fine.panels.count; j++) {
    const o = fine.panels.owner[j];
    if (o >= 0) {
      panelLength[o] += fine.panels.len[j];
      panelCount[o]++;
    }
  }
  const resolved = (k: number) => panelCount[k] > 0 && panelLength[k] / panelCount[k] <= clearance[k];
  for (let i = 0; i < m3; i++) {
    const f = fine.m[i * m3 + i];
    const c = coarse.m[i * m3 + i];
    let order = 2;
    let asymptotic = true;
    let spread = 0;
    let observed = NaN;
    if (coarsest) {
      const cc = coarsest.m[i * m3 + i];
      const ratio = (cc - c) / (c - f);
      observed = Math.log2(ratio);
      order = Number.isFinite(observed) && ratio > 0 ? Math.min(2, Math.max(1, observed)) : 1;
      asymptotic = Number.isFinite(observed) && ratio > 0 && observed >= ASYMPTOTIC_ORDER && resolved(Math.floor(i / 3));
      spread = Math.max(Math.abs(f - cc), Math.abs(f - c));
    }
    const extrapolated = f + (f - c) / (2 ** order - 1);
    orders[i] = asymptotic && coarsest ? Math.min(3.5, observed) : order;
    extrapolate[i] = asymptotic ? 1 : 0;
    // Outside the asymptotic range (a gap narrower than the panels, a thin plate) the error still falls
    // more slowly than the observed order says: the whole change from the coarsest level bounds it.
    const absoluteError = asymptotic ? Math.abs(f - extrapolated) : Math.max(Math.abs(f - extrapolated), spread);
    // Relative to the term, but not below a millionth of ρA (ρA² for rotation): a circle turning
    // about its centre moves no liquid and its added inertia is round-off.
    const A = model.wettedArea[Math.floor(i / 3)];
    const floor = 1e-6 * rho * (i % 3 < 2 ? A : A * A);
    errorEstimates.push({
      dof: i,
      body: Math.floor(i / 3),
      motion: DOFS[i % 3],
      fine: f,
      coarse: c,
      extrapolated,
      order,
      absoluteError,
      relativeError: absoluteError / Math.max(Math.abs(f), floor, 1e-300),
    });
  }
  return { errorEstimates, orders, extrapolate };
}

/** Largest estimated relative error over the terms of the given motions (e.g. the translational x and y). */
export function worstRelativeError(estimates: readonly ErrorEstimate[], motions: readonly SectionDof[]): number {
  let worst = 0;
  for (const e of estimates) if (motions.includes(e.motion)) worst = Math.max(worst, e.relativeError);
  return worst;
}
