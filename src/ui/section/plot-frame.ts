/**
 * From section coordinates (m, y up) to the plot's SVG units (y down), one scale for both axes so the
 * drawing is to scale, and a scale bar of a round length.
 */
import { niceStep } from './colour-scale';
import type { Box, Outline } from './geometry';

export interface PlotFrame {
  /** SVG units per metre. */
  s: number;
  width: number;
  height: number;
  X: (x: number) => number;
  Y: (y: number) => number;
  /** SVG point back to section coordinates. */
  toSection: (px: number, py: number) => [number, number];
}

export function plotFrame(box: Box, width: number): PlotFrame {
  const s = width / (box[2] - box[0]);
  return {
    s,
    width,
    height: (box[3] - box[1]) * s,
    X: (x) => (x - box[0]) * s,
    Y: (y) => (box[3] - y) * s,
    toSection: (px, py) => [box[0] + px / s, box[3] - py / s],
  };
}

/** An outline as an SVG points list. */
export function svgPoints(f: PlotFrame, pts: Outline): string {
  const out: string[] = [];
  for (let k = 0; k < pts.length; k += 2) out.push(`${f.X(pts[k]).toFixed(2)},${f.Y(pts[k + 1]).toFixed(2)}`);
  return out.join(' ');
}

/** An outline as a closed SVG path piece ("M … Z"). */
export function svgPath(f: PlotFrame, pts: Outline): string {
  return `M${svgPoints(f, pts).replace(/ /g, 'L')}Z`;
}

/** A round length (1, 2, 2.5 or 5 × 10^k m) about a fifth of the plot's width, for the scale bar. */
export function scaleBarLength(boxWidthM: number): number {
  return niceStep(boxWidthM / 5);
}
