/**
 * Colour scales of the flow map, in bands rather than a continuous ramp, so that every colour on the map
 * matches one labelled row of the legend. Lightness changes steadily from band to band (tested), so the
 * map also reads in grey and for colour-blind eyes; the legend gives the numbers.
 *
 * Speed: |∇φ| / U, the liquid speed over the body's speed (for rotation U = Ω r, r the farthest point of
 * the body from its centre), in fixed bands so that maps of different sections compare directly.
 * Potential: φ / (U L), signed, in bands symmetric about 0 sized to the largest value shown.
 */

export interface BandScale {
  /** Band edges, ascending; band i is [edges[i], edges[i + 1]). The ends may be ±Infinity. */
  edges: number[];
  /** One colour per band, '#rrggbb'. */
  colours: string[];
  /** One label per band, e.g. "0.5–0.75", "≥ 3". */
  labels: string[];
}

/** Pale (still liquid) to dark (fast): ten bands. */
const SEQUENTIAL = ['#f6f9e6', '#e1f0c2', '#bfe2ad', '#92cfa4', '#63b8a4', '#3f9aa2', '#30799c', '#2b5890', '#2a3a7a', '#211c52'];
/** Dark blue (most negative) through pale to dark red-brown (most positive): ten bands. */
const DIVERGING = ['#1f2f6e', '#34579a', '#5f86bd', '#9bb8da', '#dbe6f1', '#f5e3cf', '#eab98a', '#d4874f', '#a9562a', '#6b2c12'];

const MINUS = '\u2212';

/** A number for a legend: up to three significant figures, a real minus sign. */
export function legendNumber(x: number): string {
  if (x === 0) return '0';
  const t = String(Number(Math.abs(x).toPrecision(3)));
  return x < 0 ? MINUS + t : t;
}

function labelsFor(edges: number[]): string[] {
  const out: string[] = [];
  for (let i = 0; i + 1 < edges.length; i++) {
    const a = edges[i], b = edges[i + 1];
    if (a === -Infinity) out.push(`< ${legendNumber(b)}`);
    else if (b === Infinity) out.push(`≥ ${legendNumber(a)}`);
    else out.push(`${legendNumber(a)} to ${legendNumber(b)}`);
  }
  return out;
}

const SPEED_EDGES = [0, 0.1, 0.25, 0.5, 0.75, 1, 1.25, 1.5, 2, 3, Infinity];

/** Bands of |∇φ|/U (fixed). */
export function speedScale(): BandScale {
  return { edges: SPEED_EDGES.slice(), colours: SEQUENTIAL.slice(), labels: labelsFor(SPEED_EDGES) };
}

/** Smallest step of the form {1, 2, 2.5, 5} × 10^k that is at least x (x > 0). */
export function niceStep(x: number): number {
  const p = 10 ** Math.floor(Math.log10(x));
  for (const m of [1, 2, 2.5, 5, 10]) if (m * p >= x * (1 - 1e-12)) return m * p;
  return 10 * p;
}

/** Bands of φ/(U L), symmetric about 0, with steps chosen so that ±5 steps cover `maxAbs`. */
export function potentialScale(maxAbs: number): BandScale {
  const s = maxAbs > 0 && Number.isFinite(maxAbs) ? niceStep(maxAbs / 5) : 0.2;
  const edges = [-Infinity];
  // 12 figures keep the edges round (3 × 0.1 is 0.30000000000000004 in binary).
  for (let k = -4; k <= 4; k++) edges.push(Number((k * s).toPrecision(12)));
  edges.push(Infinity);
  return { edges, colours: DIVERGING.slice(), labels: labelsFor(edges) };
}

/** Band index of a value; -1 for NaN (no liquid). Values on an edge go to the band above it. */
export function bandOf(scale: BandScale, v: number): number {
  if (Number.isNaN(v)) return -1;
  const e = scale.edges;
  let i = 0;
  while (i + 2 < e.length && v >= e[i + 1]) i++;
  return i;
}

export function hexToRgb(hex: string): [number, number, number] {
  const n = parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

/** Relative luminance of an sRGB colour (WCAG 2 definition). */
export function luminance(hex: string): number {
  const lin = (c: number) => {
    const s = c / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  };
  const [r, g, b] = hexToRgb(hex);
  return 0.2126 * lin(r) + 0.7152 * lin(g) + 0.0722 * lin(b);
}

/**
 * RGBA pixels of a map for a canvas: `values` row by row with y upwards (iy·nx + ix), each multiplied by
 * `factor` before banding; image rows run downwards, so row 0 of the image is the top row of the grid.
 * No liquid (NaN) is transparent, except that a cell with no liquid at its centre next to a liquid cell
 * takes that neighbour's colour: such a cell straddles an outline, and the opaque body, wall or enclosure
 * drawn over the map covers its dry part, so the liquid colour reaches the outline without a pale fringe.
 */
export function mapPixels(values: ArrayLike<number>, nx: number, ny: number, scale: BandScale, factor = 1): Uint8ClampedArray {
  const rgb = scale.colours.map(hexToRgb);
  const band = new Int8Array(nx * ny);
  for (let k = 0; k < nx * ny; k++) band[k] = bandOf(scale, values[k] * factor);
  const px = new Uint8ClampedArray(nx * ny * 4);
  for (let iy = 0; iy < ny; iy++) {
    for (let ix = 0; ix < nx; ix++) {
      let b = band[iy * nx + ix];
      if (b < 0) {
        // First liquid neighbour, left, right, below, above.
        if (ix > 0 && band[iy * nx + ix - 1] >= 0) b = band[iy * nx + ix - 1];
        else if (ix + 1 < nx && band[iy * nx + ix + 1] >= 0) b = band[iy * nx + ix + 1];
        else if (iy > 0 && band[(iy - 1) * nx + ix] >= 0) b = band[(iy - 1) * nx + ix];
        else if (iy + 1 < ny && band[(iy + 1) * nx + ix] >= 0) b = band[(iy + 1) * nx + ix];
        if (b < 0) continue;
      }
      const o = ((ny - 1 - iy) * nx + ix) * 4;
      px[o] = rgb[b][0];
      px[o + 1] = rgb[b][1];
      px[o + 2] = rgb[b][2];
      px[o + 3] = 255;
    }
  }
  return px;
}
