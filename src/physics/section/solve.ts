/**
 * 2D added-mass section solver: the solve (see index.ts for the public surface).
 *
 * Method (why): a direct boundary-element method with flat constant panels and closed-form panel
 * integrals (assemble.ts). Panels only on the boundaries keep the unknowns few (hundreds), so a dense
 * LU solve takes milliseconds; the closed-form integrals are exact at any distance, so narrow gaps and
 * bodies near walls need no special quadrature. Nodes lie on the exact outline (circles, ellipses,
 * rounded corners), panels are graded towards corners and plate edges where the flow is singular
 * (panels.ts), and straight boundaries are represented by images or explicit panels (lines.ts,
 * domain.ts). For smooth outlines and graded corners the added mass converges like O(h²) (circles
 * faster), measured in the tests.
 *
 * Error estimate: three nested resolutions (N/4, N/2 and N panels per body; the coarser meshes are
 * every other node of the finer). The observed order p = log2((m_{N/4} − m_{N/2}) / (m_{N/2} − m_N)) is
 * bounded to [1, 2] (p = 1 when the sequence is not monotone), and the Richardson estimate of the
 * error of the reported (finest) value is |m_N − m_{N/2}| / (2^p − 1). When the observed order is below
 * 1.5 (not yet asymptotic: a gap narrower than the panels) the estimate is widened to the whole change
 * from the coarsest level, max(|m_N − m_{N/4}|, |m_N − m_{N/2}|), which brackets the true error there;
 * the same when a body's mean panel is longer than its clearance to another outline (clearance.ts). Bounding p by 2 keeps the
 * estimate conservative for circles (observed p ≈ 3); the lower bound 1 covers thin plates, which
 * converge at about p ≈ 1.2 until the panels approach the plate thickness.
 *
 * Results are per metre of length; the added-mass matrix is 3K×3K, body by body [x, y, rotation about
 * the body's reference point]. Invalid input throws at this entry (validate.ts); numerical failure is
 * returned as `{ ok: false, reason, message }`.
 */
import type { BodyResult, ErrorEstimate, SectionDof, SectionInput, SectionOutcome, SectionResult, SolveOptions } from './types';
import { checkPanelsPerBody, validateSectionInput } from './validate';
import { buildModel, type SectionModel } from './model';
import { buildPanels } from './panels';
import { solveLevel, type LevelSolution } from './solve-level';
import { symmetricEigenvalues } from '../linalg/jacobi-eigen';
import { energyCheck } from './energy';
import { bodyClearances } from './clearance';


/**
 * Observed order below which the three levels are taken to be outside the asymptotic range. Smooth
 * outlines and graded corners converge at 1.9–3; a 1 % annulus gap at 64–512 panels shows 0.5–1.6 while
 * its error is still several times the Richardson difference (measured against Fritz's closed form), and
 * a rectangle of a/b = 0.1 shows 1.65 at 128 panels with its extrapolation still 0.14 % off.
 */
const ASYMPTOTIC_ORDER = 1.8;

/** Default nominal panels per body at the finest resolution (thin bodies get up to 2× more). */
export const DEFAULT_PANELS_PER_BODY = 128;

/**
 * Most panels at the finest level, all bodies and boundaries together: the dense LU grows as P³
 * (2,048 panels solve in a few seconds; 8,000 would take minutes and half a gigabyte).
 */
export const MAX_TOTAL_PANELS = 2048;

const DOFS: SectionDof[] = ['x', 'y', 'rotation'];

export interface SolvedSection {
  outcome: SectionOutcome;
  /** The model and fine-level solution, for flow maps (absent when the solve failed). */
  model?: SectionModel;
  fine?: LevelSolution;
}

/** Solves the section and returns the added-mass matrix and per-body results. */
export function solveSection(input: SectionInput, options: SolveOptions = {}): SectionOutcome {
  return solveSectionDetailed(input, options).outcome;
}

function failure(reason: 'singular-system', column: number): SolvedSection {
  return {
    outcome: {
      ok: false,
      reason,
      message: `the boundary-element system is singular (pivot column ${column}); outlines may touch or overlap`,
    },
  };
}

/** Same as `solveSection`, also returning the model and the fine-level solution. */
export function solveSectionDetailed(input: SectionInput, options: SolveOptions = {}): SolvedSection {
  validateSectionInput(input);
  return solveAt(input, options.panelsPerBody ?? input.panelsPerBody ?? DEFAULT_PANELS_PER_BODY, options);
}

/** One solve at N nominal panels per body (the input is already validated). */
function solveAt(input: SectionInput, N: number, options: SolveOptions): SolvedSection {
  checkPanelsPerBody(N);
  const rho = input.liquidDensityKgPerM3;
  const model = buildModel(input, N);
  let total = 0;
  for (const s of model.spans) for (const c of s.coarseCounts) total += 4 * c;
  if (total > MAX_TOTAL_PANELS) {
    throw new RangeError(
      `the section needs ${total} panels at its finest level (${input.bodies.length} bodies at panelsPerBody = ${N}, thin bodies and polygon edges take more), ` +
        `more than the ${MAX_TOTAL_PANELS} the solver allows; lower panelsPerBody or use fewer bodies or polygon points`,
    );
  }
  const K = input.bodies.length;
  const m3 = 3 * K;
  const level = (factor: number) => solveLevel(buildPanels(model.spans, factor), model.group, model.refX, model.refY, rho, model.closed);
  const fineOut = level(4);
  if (!fineOut.ok) return failure('singular-system', fineOut.column);
  const fine = fineOut.level;
  let coarse: LevelSolution | null = null;
  let coarsest: LevelSolution | null = null;
  if (!options.skipErrorEstimate) {
    const c = level(2);
    if (c.ok) coarse = c.level;
    const cc = level(1);
    if (cc.ok) coarsest = cc.level;
  }

  const m = Float64Array.from(fine.m);
  let maxDiag = 0;
  for (let i = 0; i < m3; i++) maxDiag = Math.max(maxDiag, Math.abs(m[i * m3 + i]));
  let asym = 0;
  for (let i = 0; i < m3; i++) {
    for (let j = i + 1; j < m3; j++) {
      asym = Math.max(asym, Math.abs(m[i * m3 + j] - m[j * m3 + i]));
      const v = 0.5 * (m[i * m3 + j] + m[j * m3 + i]);
      m[i * m3 + j] = v;
      m[j * m3 + i] = v;
    }
  }
  for (let i = 0; i < m.length; i++) {
    if (!Number.isFinite(m[i])) {
      return { outcome: { ok: false, reason: 'non-finite-result', message: 'the added-mass matrix has non-finite entries' } };
    }
  }
  const ev = symmetricEigenvalues(m, m3);
  // A kinetic energy cannot be negative: tolerate only round-off-sized negative eigenvalues.
  if (ev[0] < -1e-6 * Math.max(maxDiag, 1e-300)) {
    return {
      outcome: {
        ok: false,
        reason: 'not-positive-semidefinite',
        message: `the added-mass matrix is not positive semi-definite (smallest eigenvalue ${ev[0].toExponential(3)} against largest diagonal ${maxDiag.toExponential(3)}); use more panels`,
      },
    };
  }

  const errorEstimates: ErrorEstimate[] = [];
  /** Order used to extrapolate the reported value: observed, within [ASYMPTOTIC_ORDER, 3.5] (circles converge at ~3). */
  const orders = new Float64Array(m3);
  const extrapolate = new Uint8Array(m3);
  if (coarse) {
    // Mean fine panel length per body against its clearance: panels longer than the gap are pre-asymptotic.
    const clearance = bodyClearances(model);
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
      if (coarsest) {
        const cc = coarsest.m[i * m3 + i];
        const ratio = (cc - c) / (c - f);
        const observed = Math.log2(ratio);
        order = Number.isFinite(observed) && ratio > 0 ? Math.min(2, Math.max(1, observed)) : 1;
        asymptotic = Number.isFinite(observed) && ratio > 0 && observed >= ASYMPTOTIC_ORDER && resolved(Math.floor(i / 3));
        spread = Math.max(Math.abs(f - cc), Math.abs(f - c));
      }
      const extrapolated = f + (f - c) / (2 ** order - 1);
      orders[i] = asymptotic ? Math.min(3.5, Math.log2((coarsest!.m[i * m3 + i] - c) / (c - f))) : order;
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
  }

  // Reported values: Richardson-extrapolated where both terms' levels are in the asymptotic range (30–100×
  // closer to the converged value than the finest level there); elsewhere the finest value, which the
  // widened estimate brackets.
  const reported = Float64Array.from(m);
  if (coarse && options.extrapolate !== false) {
    for (let i = 0; i < m3; i++) {
      for (let j = 0; j < m3; j++) {
        if (!extrapolate[i] || !extrapolate[j]) continue;
        const p = Math.min(orders[i], orders[j]);
        const f = 0.5 * (fine.m[i * m3 + j] + fine.m[j * m3 + i]);
        const c = 0.5 * (coarse.m[i * m3 + j] + coarse.m[j * m3 + i]);
        reported[i * m3 + j] = f + (f - c) / (2 ** p - 1);
      }
    }
  }

  const bodies: BodyResult[] = input.bodies.map((_, k) => {
    const mx = reported[3 * k * m3 + 3 * k];
    const my = reported[(3 * k + 1) * m3 + 3 * k + 1];
    const mr = reported[(3 * k + 2) * m3 + 3 * k + 2];
    const ax = model.halfWidthForX[k];
    const ay = model.halfWidthForY[k];
    const displaced = rho * model.wettedArea[k];
    let panels = 0;
    for (let j = 0; j < fine.panels.count; j++) if (fine.panels.owner[j] === k) panels++;
    return {
      index: k,
      referencePointM: [model.refX[k], model.refY[k]],
      wettedAreaM2: model.wettedArea[k],
      displacedMassKgPerM: displaced,
      addedMassX: mx,
      addedMassY: my,
      addedInertiaRotation: mr,
      caX: ax > 0 ? mx / (rho * Math.PI * ax * ax) : 0,
      caY: ay > 0 ? my / (rho * Math.PI * ay * ay) : 0,
      referenceHalfWidthXM: ax,
      referenceHalfWidthYM: ay,
      addedToDisplacedX: displaced > 0 ? mx / displaced : 0,
      addedToDisplacedY: displaced > 0 ? my / displaced : 0,
      blockedDofs: DOFS.filter((_, d) => fine.blocked[3 * k + d]),
      panels,
    };
  });

  const addedMass: number[][] = [];
  for (let i = 0; i < m3; i++) addedMass.push(Array.from(reported.subarray(i * m3, (i + 1) * m3)));
  const notes = model.notes.slice();
  notes.push(
    'direct boundary-element method: flat constant panels, exact panel integrals, nodes on the exact outline, panels graded towards corners',
    'Ca = added mass / (ρ π a²), a = half the wetted extent across the motion (x motion: along y; y motion: along x)',
    'error estimate: Richardson extrapolation from N/4, N/2 and N panels per body, observed order bounded to [1, 2]; reported values are the extrapolated ones where the observed order is at least 1.5 and the panels are shorter than the narrowest gap, else the finest',
  );
  if (bodies.some((b) => b.blockedDofs.length > 0)) {
    notes.push('blocked motions (a body resting on a wall moving off it) carry a net flux through the contact; their rows and columns are set to 0');
  }
  const result: SectionResult = {
    addedMass,
    asymmetry: maxDiag > 0 ? asym / maxDiag : 0,
    bodies,
    errorEstimates,
    energyChecks: [],
    panelsFine: fine.panels.count,
    panelsCoarse: coarse ? coarse.panels.count : 0,
    notes,
  };
  if (options.energyCheck) result.energyChecks = energyCheck(model, fine, m, rho, options.energyGridCells ?? 96);
  return { outcome: { ok: true, result }, model, fine };
}
