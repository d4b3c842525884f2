/**
 * Nodal lines of a plate mode shape sampled on a grid: the zero contour by marching squares (linear
 * interpolation along each cell edge; a saddle cell is split by the sign at its centre). Pure.
 * Grid layout as the plate engine gives it: `w[iy·nx + ix]`, ix from the left edge, iy up from the bottom.
 */

/** A segment in grid units: x from 0 (left edge) to nx − 1, y from 0 (bottom edge) to ny − 1. */
export type Segment = [x0: number, y0: number, x1: number, y1: number];

/**
 * Values this small against the largest |w| (1) count as zero, and zero counts as positive, so a nodal line
 * that runs exactly through grid points (a symmetry line) is found; lines along the plate's own edges (held
 * edges are zero) are then left out.
 */
const ZERO = 1e-6;

export function nodalSegments(w: ArrayLike<number>, nx: number, ny: number): Segment[] {
  const out: Segment[] = [];
  const zeroed = (ix: number, iy: number): number => {
    const v = w[iy * nx + ix];
    return Math.abs(v) < ZERO ? 0 : v;
  };
  // A held edge is zero all along: there a point takes the sign of its inward neighbour (scaled to nothing), so
  // the edge itself makes no line and a nodal line meets the edge where it should.
  const at = (ix: number, iy: number): number => {
    const v = zeroed(ix, iy);
    if (v !== 0 || (ix > 0 && ix < nx - 1 && iy > 0 && iy < ny - 1)) return v;
    const inner = zeroed(Math.min(Math.max(ix, 1), nx - 2), Math.min(Math.max(iy, 1), ny - 2));
    return 1e-12 * Math.sign(inner);
  };
  for (let iy = 0; iy + 1 < ny; iy++) {
    for (let ix = 0; ix + 1 < nx; ix++) {
      // Corners counter-clockwise from the lower left; crossings on the edges between sign changes.
      const c: [number, number, number][] = [
        [ix, iy, at(ix, iy)],
        [ix + 1, iy, at(ix + 1, iy)],
        [ix + 1, iy + 1, at(ix + 1, iy + 1)],
        [ix, iy + 1, at(ix, iy + 1)],
      ];
      const pts: [number, number][] = [];
      for (let k = 0; k < 4; k++) {
        const [xa, ya, va] = c[k];
        const [xb, yb, vb] = c[(k + 1) % 4];
        if (va < 0 !== vb < 0) {
          const t = va / (va - vb);
          pts.push([xa + t * (xb - xa), ya + t * (yb - ya)]);
        }
      }
      const onEdge = (a: [number, number], b: [number, number]): boolean =>
        (a[0] === b[0] && (a[0] === 0 || a[0] === nx - 1)) || (a[1] === b[1] && (a[1] === 0 || a[1] === ny - 1));
      if (pts.length === 2) {
        if (!onEdge(pts[0], pts[1])) out.push([pts[0][0], pts[0][1], pts[1][0], pts[1][1]]);
      }
      else if (pts.length === 4) {
        const centre = c[0][2] + c[1][2] + c[2][2] + c[3][2] >= 0 ? 1 : -1;
        // Crossing k lies on edge k (bottom, right, top, left). The lines cut off the two corners whose sign the
        // centre does not share: with the centre like corner 0, they cut off corners 1 and 3.
        const first = (centre > 0) === (c[0][2] >= 0) ? [0, 1, 2, 3] : [1, 2, 3, 0];
        out.push([pts[first[0]][0], pts[first[0]][1], pts[first[1]][0], pts[first[1]][1]]);
        out.push([pts[first[2]][0], pts[first[2]][1], pts[first[3]][0], pts[first[3]][1]]);
      }
    }
  }
  return out;
}
