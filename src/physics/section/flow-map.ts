/**
 * Flow-speed map for the app's Section view: speed |∇φ| and potential φ of a unit rigid motion of one
 * body on a caller's rectangular grid, written into caller buffers (NaN outside the liquid).
 */
import type { SectionDof, SectionInput, SolveOptions } from './types';
import { evaluatePointInto, fieldContext, inLiquid, zeroLines } from './field-eval';
import { DEFAULT_MAX_PANELS_PER_BODY, solveSectionDetailed } from './solve';

/** A rectangular grid of points: nx × ny points from (x0, y0) to (x1, y1) inclusive, row by row (y outer). */
export interface FlowFieldGrid {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
  nx: number;
  ny: number;
}

export type FlowFieldResult =
  | { ok: true; maxSpeed: number; liquidPoints: number }
  | { ok: false; reason: 'singular-system' | 'not-positive-semidefinite' | 'non-finite-result'; message: string };

const DOF_INDEX: Record<SectionDof, number> = { x: 0, y: 1, rotation: 2 };

/**
 * Flow-speed map for a unit motion of one body: writes |∇φ| (m/s per m/s, or per rad/s for rotation)
 * at grid point (ix, iy) into `speed[iy·nx + ix]`, and φ into `potential` if given; NaN marks points
 * inside bodies or outside the liquid. Solves the section first (fine level only).
 */
export function flowFieldInto(
  input: SectionInput,
  body: number,
  motion: SectionDof,
  grid: FlowFieldGrid,
  speed: Float64Array,
  potential?: Float64Array,
  options: SolveOptions = {},
): FlowFieldResult {
  if (!(Number.isInteger(body) && body >= 0 && body < input.bodies.length)) {
    throw new RangeError(`body must be an integer from 0 to ${input.bodies.length - 1}, got ${body}`);
  }
  if (!(motion in DOF_INDEX)) throw new RangeError(`motion must be one of x, y, rotation, got ${String(motion)}`);
  const { nx, ny } = grid;
  if (!(Number.isInteger(nx) && nx >= 2 && Number.isInteger(ny) && ny >= 2)) {
    throw new RangeError(`grid.nx and grid.ny must be integers ≥ 2, got ${nx} × ${ny}`);
  }
  for (const k of ['x0', 'y0', 'x1', 'y1'] as const) {
    if (!Number.isFinite(grid[k])) throw new RangeError(`grid.${k} must be a finite number, got ${grid[k]}`);
  }
  if (speed.length < nx * ny) throw new RangeError(`speed must hold nx·ny = ${nx * ny} values, got ${speed.length}`);
  if (potential && potential.length < nx * ny) throw new RangeError(`potential must hold nx·ny = ${nx * ny} values, got ${potential.length}`);
  // The field is drawn from the finest level itself (no extrapolation of a field), so without a given
  // resolution it uses the default's cap (128 per body) rather than its 64-panel start: ~1e-5 of U at a
  // radius from a circle's outline instead of ~2e-3.
  const panelsPerBody = options.panelsPerBody ?? input.panelsPerBody ?? DEFAULT_MAX_PANELS_PER_BODY;
  const solved = solveSectionDetailed(input, { ...options, panelsPerBody, skipErrorEstimate: true });
  if (!solved.outcome.ok || !solved.model || !solved.fine) {
    return solved.outcome.ok ? { ok: false, reason: 'non-finite-result', message: 'no solution' } : solved.outcome;
  }
  const ctx = fieldContext(solved.model.group, solved.fine, [3 * body + DOF_INDEX[motion]], zeroLines(solved.model));
  const out = new Float64Array(3);
  let maxSpeed = 0;
  let liquidPoints = 0;
  for (let iy = 0; iy < ny; iy++) {
    const y = grid.y0 + ((grid.y1 - grid.y0) * iy) / (ny - 1);
    for (let ix = 0; ix < nx; ix++) {
      const x = grid.x0 + ((grid.x1 - grid.x0) * ix) / (nx - 1);
      const k = iy * nx + ix;
      if (!inLiquid(solved.model, x, y)) {
        speed[k] = NaN;
        if (potential) potential[k] = NaN;
        continue;
      }
      evaluatePointInto(ctx, x, y, out);
      const s = Math.hypot(out[1], out[2]);
      speed[k] = s;
      if (potential) potential[k] = out[0];
      if (s > maxSpeed) maxSpeed = s;
      liquidPoints++;
    }
  }
  return { ok: true, maxSpeed, liquidPoints };
}

/** Allocating wrapper of `flowFieldInto`. */
export function flowField(
  input: SectionInput,
  body: number,
  motion: SectionDof,
  grid: FlowFieldGrid,
  options: SolveOptions = {},
): { result: FlowFieldResult; speed: Float64Array; potential: Float64Array } {
  const speed = new Float64Array(grid.nx * grid.ny);
  const potential = new Float64Array(grid.nx * grid.ny);
  const result = flowFieldInto(input, body, motion, grid, speed, potential, options);
  return { result, speed, potential };
}

