/**
 * Is each mode's frequency monotone in each ranged input? The corner (vertex) method gives the exact
 * extremes of a function over a box only when it is monotone in every input over the whole box, so this
 * is checked three ways, per input and per mode, dry and wet:
 * - along the input's axis through the likely point: low, one third, two thirds, high and the likely value;
 * - at the corners: every pair of corners that differ in this input only must change the same way;
 * - mode order: consecutive axis settings whose mode shapes swap (modal assurance criterion) show two modes
 *   crossing, where "the k-th lowest frequency" can turn back.
 * Band mode k is the k-th lowest frequency at each setting.
 */
import type { EvaluationStore } from './evaluate';
import { SHAPE_GRID } from './evaluate';

export type Direction = 'up' | 'down' | 'flat' | 'non-monotone';

/**
 * Relative change below which two frequencies count as equal: a tenth of the default mesh tolerance (0.05 %).
 * Moving a breakpoint (a water level, a support) re-spreads the fixed element count, which moves the
 * frequencies by about the mesh's own accuracy; a turn smaller than that is not a turn a screening can see.
 */
export const FLAT_RTOL = 5e-5;

/** Values along one input's axis (others at their likely values), with the store index of each setting. */
export interface Axis {
  path: string;
  values: number[];
  points: number[];
  /** Per state, per mode. */
  direction: { dry: Direction[]; wet: Direction[] | null };
  /** Per state, per mode: the mode's shape swapped with another's between consecutive axis settings. */
  crossing: { dry: boolean[]; wet: boolean[] | null };
}

/** Axis settings of a range: low, thirds, high and the likely value, ascending, without repeats. */
export function axisValues(low: number, likely: number, high: number): number[] {
  const raw = [low, low + (high - low) / 3, low + (2 * (high - low)) / 3, high, likely].sort((a, b) => a - b);
  return raw.filter((v, i) => i === 0 || v !== raw[i - 1]);
}

function sign(a: number, b: number): number {
  const d = b - a;
  return Math.abs(d) <= FLAT_RTOL * Math.max(Math.abs(a), Math.abs(b)) ? 0 : d > 0 ? 1 : -1;
}

/** Direction of a sequence of frequencies taken at ascending settings. */
export function directionOf(series: readonly number[]): Direction {
  let up = false;
  let down = false;
  for (let i = 1; i < series.length; i++) {
    const s = sign(series[i - 1], series[i]);
    up ||= s > 0;
    down ||= s < 0;
  }
  return up && down ? 'non-monotone' : up ? 'up' : down ? 'down' : 'flat';
}

/** Modal assurance criterion (a·b)² / ((a·a)(b·b)) of two shapes on the common grid. */
export function mac(a: Float64Array, ai: number, b: Float64Array, bi: number): number {
  let ab = 0;
  let aa = 0;
  let bb = 0;
  for (let g = 0; g < SHAPE_GRID; g++) {
    const x = a[ai * SHAPE_GRID + g];
    const y = b[bi * SHAPE_GRID + g];
    ab += x * y;
    aa += x * x;
    bb += y * y;
  }
  return aa > 0 && bb > 0 ? (ab * ab) / (aa * bb) : 1;
}

/**
 * Modes whose shape at one setting matches another mode at the next better than itself (and itself poorly):
 * the order of the two has changed between the settings.
 */
export function crossedModes(before: Float64Array, after: Float64Array, modes: number): boolean[] {
  const out = new Array<boolean>(modes).fill(false);
  for (let j = 0; j < modes; j++) {
    const self = mac(before, j, after, j);
    if (self >= 0.5) continue;
    for (let l = 0; l < modes; l++) {
      if (l !== j && mac(before, j, after, l) > self) {
        out[j] = true;
        out[l] = true;
      }
    }
  }
  return out;
}

/** Per state and mode: the sign every corner pair differing in `input` agrees on, or 'non-monotone'. */
export function cornerDirections(store: EvaluationStore, cornerPoints: readonly number[], input: number, state: 'dry' | 'wet'): Direction[] {
  const out: Direction[] = [];
  for (let j = 0; j < store.modes; j++) {
    let up = false;
    let down = false;
    for (let c = 0; c < cornerPoints.length; c++) {
      if (c & (1 << input)) continue;
      const s = sign(store.frequency(cornerPoints[c], state, j), store.frequency(cornerPoints[c | (1 << input)], state, j));
      up ||= s > 0;
      down ||= s < 0;
    }
    out.push(up && down ? 'non-monotone' : up ? 'up' : down ? 'down' : 'flat');
  }
  return out;
}

/** Whether two directions contradict each other (one up, the other down, or either non-monotone). */
export function disagree(a: Direction, b: Direction): boolean {
  if (a === 'non-monotone' || b === 'non-monotone') return true;
  return (a === 'up' && b === 'down') || (a === 'down' && b === 'up');
}
