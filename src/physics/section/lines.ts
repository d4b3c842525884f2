/**
 * Straight boundaries (walls and free surfaces) and the image group they generate.
 *
 * Without an enclosure the liquid region is a half-plane or a quarter-plane and straight boundaries
 * are represented exactly by images (classical method of images, e.g. Milne-Thomson, Theoretical
 * Hydrodynamics, ch. 8): a rigid wall (∂φ/∂n = 0) reflects a source with the same sign, a free surface
 * in the high-frequency limit (φ = 0) with the opposite sign. Two perpendicular lines give a group of
 * four (identity, two reflections, the half-turn about their crossing), which is exact. Two parallel
 * or oblique lines would need an infinite series; those are rejected without an enclosure.
 * Inside an enclosure every straight boundary is panelled explicitly instead (see domain.ts).
 */

/** A straight boundary: the line through (px, py) with unit normal (nx, ny) pointing into the liquid. */
export interface Line {
  index: number;
  kind: 'wall' | 'free-surface';
  px: number;
  py: number;
  nx: number;
  ny: number;
}

/** Signed distance of a point from the line, positive on the liquid side. */
export function lineDistance(l: Line, x: number, y: number): number {
  return (x - l.px) * l.nx + (y - l.py) * l.ny;
}

/**
 * Image group element: x' = M x + c, Green's-function weight `sign`. Elements are isometric involutions
 * (reflections, half-turn), so G(x, g y) = G(g x, y): image terms are panel integrals seen from g x.
 */
export interface ImageMap {
  m00: number;
  m01: number;
  m10: number;
  m11: number;
  c0: number;
  c1: number;
  sign: number;
}

export const IDENTITY_MAP: ImageMap = { m00: 1, m01: 0, m10: 0, m11: 1, c0: 0, c1: 0, sign: 1 };

/** Reflection in a line: x' = x − 2((x − P)·n) n. */
function reflection(l: Line): ImageMap {
  const { nx, ny, px, py } = l;
  const d = px * nx + py * ny;
  return {
    m00: 1 - 2 * nx * nx,
    m01: -2 * nx * ny,
    m10: -2 * nx * ny,
    m11: 1 - 2 * ny * ny,
    c0: 2 * d * nx,
    c1: 2 * d * ny,
    sign: l.kind === 'wall' ? 1 : -1,
  };
}

function compose(a: ImageMap, b: ImageMap): ImageMap {
  // (a ∘ b)(x) = Ma (Mb x + cb) + ca
  return {
    m00: a.m00 * b.m00 + a.m01 * b.m10,
    m01: a.m00 * b.m01 + a.m01 * b.m11,
    m10: a.m10 * b.m00 + a.m11 * b.m10,
    m11: a.m10 * b.m01 + a.m11 * b.m11,
    c0: a.m00 * b.c0 + a.m01 * b.c1 + a.c0,
    c1: a.m10 * b.c0 + a.m11 * b.c1 + a.c1,
    sign: a.sign * b.sign,
  };
}

/** Image group for 0, 1 or 2 perpendicular lines (validated by the caller). Identity first. */
export function imageGroup(lines: readonly Line[]): ImageMap[] {
  if (lines.length === 0) return [IDENTITY_MAP];
  const r1 = reflection(lines[0]);
  if (lines.length === 1) return [IDENTITY_MAP, r1];
  const r2 = reflection(lines[1]);
  return [IDENTITY_MAP, r1, r2, compose(r1, r2)];
}

export function applyMap(g: ImageMap, x: number, y: number, out: number[] | Float64Array): void {
  out[0] = g.m00 * x + g.m01 * y + g.c0;
  out[1] = g.m10 * x + g.m11 * y + g.c1;
}

/** True if two unit normals are perpendicular within round-off. */
export function perpendicular(a: Line, b: Line): boolean {
  return Math.abs(a.nx * b.nx + a.ny * b.ny) < 1e-9;
}
