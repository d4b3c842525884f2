/**
 * From a worker's flow map (per unit motion) to what the view shows: values relative to the body's motion,
 * their band scale and words for the legend, and the value under a tapped point.
 *
 * Speed is shown as |∇φ|/U: for sway and heave the map is already per m/s of body speed; for rotation it is
 * per rad/s, and U = Ω r with r the farthest point of the body from its reference point (its edge speed).
 * Potential is shown as φ/(U L) with L = r, a dimensionless number of the same order as the speed.
 */
import type { SectionInput } from '../../physics/section';
import type { SectionField } from '../../app/solve-section';
import { potentialScale, speedScale, type BandScale } from './colour-scale';
import { farthestRadius } from './geometry';

export type MapQuantity = 'speed' | 'potential';

export interface MapDisplay {
  scale: BandScale;
  /** Multiplies the worker's values into the shown, dimensionless values. */
  factor: number;
  values: readonly number[];
  /** Largest shown magnitude on the map (speed: max |∇φ|/U; potential: max |φ|/(U L)). */
  max: number;
  /** What the numbers are, for the legend's title. */
  title: string;
  /** How they are made dimensionless, in words. */
  basis: string;
}

/** The shown values of a map and their scale. */
export function mapDisplay(field: SectionField, input: SectionInput, quantity: MapQuantity, formatLength: (m: number) => string): MapDisplay {
  const r = farthestRadius(input.bodies[field.body]);
  const rot = field.motion === 'rotation';
  const rText = `r = ${formatLength(r)}, the farthest point of body ${field.body + 1} from its centre`;
  if (quantity === 'speed') {
    const factor = rot ? 1 / r : 1;
    return {
      scale: speedScale(),
      factor,
      values: field.speed,
      max: field.maxSpeed * factor,
      title: 'Liquid speed / body speed, |∇φ|/U',
      basis: rot ? `U = Ω r, the body's edge speed (${rText})` : 'U = the body speed',
    };
  }
  const factor = rot ? 1 / (r * r) : 1 / r;
  let max = 0;
  for (const v of field.potential) if (Number.isFinite(v)) max = Math.max(max, Math.abs(v * factor));
  return {
    scale: potentialScale(max),
    factor,
    values: field.potential,
    max,
    title: 'Velocity potential, φ/(U L)',
    basis: rot ? `U = Ω r, L = r (${rText})` : `U = the body speed, L = r (${rText})`,
  };
}

/** The grid point nearest to (x, y), m: its index and position; null outside the grid. */
export function nearestPoint(field: SectionField, x: number, y: number): { k: number; x: number; y: number } | null {
  const { x0, y0, x1, y1, nx, ny } = field.grid;
  const hx = (x1 - x0) / (nx - 1), hy = (y1 - y0) / (ny - 1);
  const ix = Math.round((x - x0) / hx), iy = Math.round((y - y0) / hy);
  if (ix < 0 || iy < 0 || ix >= nx || iy >= ny) return null;
  return { k: iy * nx + ix, x: x0 + ix * hx, y: y0 + iy * hy };
}

/** The map value nearest to (x, y), m, times `factor`; NaN outside the grid or where there is no liquid. */
export function valueAt(field: SectionField, values: readonly number[], factor: number, x: number, y: number): number {
  const p = nearestPoint(field, x, y);
  return p ? values[p.k] * factor : NaN;
}
