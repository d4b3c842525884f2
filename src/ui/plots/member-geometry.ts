/**
 * Pure helpers that turn a member model into drawing primitives for the schematic (no DOM here,
 * so they are tested on their own). Vertical scale is true; the drawn width is true to the same
 * scale but never thinner than a few pixels, so a slender member stays visible.
 */
import type { MemberModel, MemberSection } from '../../physics/beam/model';
import { shapeOf } from '../../physics/shapes/registry';

export interface PlotBox {
  widthPx: number;
  heightPx: number;
  /** Margin at top and bottom, px. */
  padPx: number;
}

/** Drawn width of a section in the plane of bending: its depth along the motion, m (tube/rod diameter, plate thickness). */
export function outerWidthM(s: MemberSection): number {
  return shapeOf(s).depthM(s);
}

/** Metres along the member to the SVG y coordinate (z = 0 at the bottom). */
export function zToY(zM: number, lengthM: number, box: PlotBox): number {
  const usable = box.heightPx - 2 * box.padPx;
  return box.padPx + usable * (1 - zM / lengthM);
}

/** Pixels per metre of the vertical scale. */
export function pxPerM(lengthM: number, box: PlotBox): number {
  return (box.heightPx - 2 * box.padPx) / lengthM;
}

export interface SegmentRect {
  x: number;
  y: number;
  width: number;
  height: number;
  /** Extra width drawn for coating or growth, px each side (0 when none). */
  coatPx: number;
}

/** One rectangle (trapezoid approximated by its mean width) per segment, centred on `cx`. */
export function segmentRects(model: MemberModel, box: PlotBox, cx: number, minWidthPx = 6): SegmentRect[] {
  const s = pxPerM(model.lengthM, box);
  return model.segments.map((seg) => {
    const w0 = outerWidthM(seg.section);
    const w1 = seg.endSection ? outerWidthM(seg.endSection) : w0;
    const width = Math.max(minWidthPx, ((w0 + w1) / 2) * s);
    const coatPx = seg.coating && seg.coating.thicknessM > 0 ? Math.max(2, seg.coating.thicknessM * s) : 0;
    const yTop = zToY(seg.toM, model.lengthM, box);
    const yBottom = zToY(seg.fromM, model.lengthM, box);
    return { x: cx - width / 2, y: yTop, width, height: yBottom - yTop, coatPx };
  });
}

/**
 * A mode shape as an SVG polyline: lateral offset = displacement × amplitudePx from the member axis,
 * displacement already normalised to max |1| by the solver (re-normalised here to be safe).
 */
export function shapePoints(zM: readonly number[], displacement: readonly number[], lengthM: number, box: PlotBox, cx: number, amplitudePx: number): string {
  let max = 0;
  for (const d of displacement) max = Math.max(max, Math.abs(d));
  const k = max > 0 ? amplitudePx / max : 0;
  const pts: string[] = [];
  for (let i = 0; i < zM.length; i++) {
    pts.push(`${(cx + displacement[i] * k).toFixed(1)},${zToY(zM[i], lengthM, box).toFixed(1)}`);
  }
  return pts.join(' ');
}

/**
 * Label positions for landmarks inside the member's length, pushed apart so no two overlap:
 * sorted top to bottom, each at least `gapPx` below the one above. Landmarks outside [0, L] are left out
 * (they are listed beside the plot instead).
 */
export function landmarkLabels(marks: readonly { label: string; zM: number }[], lengthM: number, box: PlotBox, gapPx = 12): { label: string; yLine: number; yText: number }[] {
  const inside = marks
    .filter((m) => m.zM >= -1e-9 * lengthM && m.zM <= lengthM * (1 + 1e-9))
    .map((m) => ({ label: m.label, yLine: zToY(m.zM, lengthM, box) }))
    .sort((a, b) => a.yLine - b.yLine);
  let last = -Infinity;
  return inside.map((m) => {
    const yText = Math.max(m.yLine - 3, last + gapPx, gapPx);
    last = yText;
    return { ...m, yText };
  });
}
