/**
 * What the section worker does, as a plain function (tested in Node without a worker): solve one 2D
 * section for its added-mass matrix (optionally with the kinetic-energy cross-check), then the flow map
 * of one body's unit motion on the grid the view asked for. Input errors come back as messages, never as
 * exceptions across the worker boundary.
 *
 * The energy cross-check costs several times the solve itself, so the view asks twice: first without it
 * (numbers and map quickly), then with it. A one-entry memo keyed by the input keeps the second request
 * and a change of the mapped motion from solving the same section again.
 */
import { flowField, solveSection, type FlowFieldGrid, type SectionDof, type SectionFailure, type SectionInput, type SectionResult } from '../physics/section';

export interface SectionMapRequest {
  /** Index of the body whose unit motion is mapped. */
  body: number;
  motion: SectionDof;
  /** Points of the map (cell centres), row by row, y outer (see FlowFieldGrid). */
  grid: FlowFieldGrid;
}

export interface SectionRequest {
  op: 'section';
  input: SectionInput;
  /** Run the kinetic-energy cross-check (slower). */
  energyCheck: boolean;
  /** The flow map to compute after the solve, or null for numbers only. */
  map: SectionMapRequest | null;
}

/**
 * A flow map of a unit motion (1 m/s, or 1 rad/s for rotation): speed |∇φ| and potential φ at the grid
 * points, row by row (index iy·nx + ix), NaN where there is no liquid (inside bodies, dry side, outside the
 * enclosure). Plain arrays so the answer survives any structured clone.
 */
export interface SectionField {
  body: number;
  motion: SectionDof;
  grid: FlowFieldGrid;
  speed: number[];
  potential: number[];
  maxSpeed: number;
  liquidPoints: number;
}

export type SectionAnswer =
  | {
      ok: true;
      result: SectionResult;
      /** The map asked for; null if none was asked for or it could not be made (see fieldError). */
      field: SectionField | null;
      fieldError: string | null;
      elapsedMs: number;
    }
  | { ok: false; reason: SectionFailure | 'invalid-input'; message: string };

/** One-entry memo of the last solved input (by its JSON text). */
export interface SectionMemo {
  key: string;
  result: SectionResult | null;
}

export function createSectionMemo(): SectionMemo {
  return { key: '', result: null };
}

function message(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

/** Solves the request's section (re-using the memo when the input is the same) and makes its map. */
export function solveSectionRequest(
  req: SectionRequest,
  memo: SectionMemo = createSectionMemo(),
  now: () => number = () => performance.now(),
): SectionAnswer {
  const t0 = now();
  const key = JSON.stringify(req.input);
  let result = memo.key === key ? memo.result : null;
  if (!result || (req.energyCheck && result.energyChecks.length === 0)) {
    let outcome;
    try {
      outcome = solveSection(req.input, { energyCheck: req.energyCheck });
    } catch (e) {
      return { ok: false, reason: 'invalid-input', message: message(e) };
    }
    if (!outcome.ok) return outcome;
    result = outcome.result;
    memo.key = key;
    memo.result = result;
  }
  let field: SectionField | null = null;
  let fieldError: string | null = null;
  if (req.map) {
    const { body, motion, grid } = req.map;
    try {
      const f = flowField(req.input, body, motion, grid);
      if (f.result.ok) {
        field = {
          body,
          motion,
          grid,
          speed: Array.from(f.speed),
          potential: Array.from(f.potential),
          maxSpeed: f.result.maxSpeed,
          liquidPoints: f.result.liquidPoints,
        };
      } else {
        fieldError = f.result.message;
      }
    } catch (e) {
      fieldError = message(e);
    }
  }
  return { ok: true, result, field, fieldError, elapsedMs: now() - t0 };
}
