/**
 * Levels and stretches of the member for the legend beside the mode-shape plot (numbers in the user's
 * units, not only inside the SVG), and the landmarks handed to the plot: coincident levels merged into one
 * label, levels outside the drawn length left to the table.
 */
import type { Landmark, MemberBuild } from '../../kinds/common/types';
import { type DisplayUnits, rangeText, zText } from './display-units';

/** Levels closer than this fraction of the member length share one line on the plot. */
const SAME_LEVEL_RTOL = 1e-6;

export interface LevelRow {
  label: string;
  z: string;
  /** True when the level lies outside the member (not drawn on the schematic). */
  outside: boolean;
}

function outside(zM: number, lengthM: number): boolean {
  const tol = SAME_LEVEL_RTOL * lengthM;
  return zM < -tol || zM > lengthM + tol;
}

export function levelRows(build: MemberBuild, units: DisplayUnits): LevelRow[] {
  const L = build.model.lengthM;
  return build.landmarks.map((m) => ({ label: m.label, z: zText(m.zM, units), outside: outside(m.zM, L) }));
}

export function stretchRows(build: MemberBuild, units: DisplayUnits): { label: string; range: string }[] {
  return build.bands.map((b) => ({ label: b.label, range: rangeText(b.fromM, b.toM, units.length) }));
}

/** Landmarks for the schematic: inside the member, one per level, labels joined ("Pile top, Top mass"). */
export function plotLandmarks(landmarks: readonly Landmark[], lengthM: number): { label: string; zM: number }[] {
  const out: { label: string; zM: number }[] = [];
  const tol = SAME_LEVEL_RTOL * lengthM;
  for (const m of landmarks) {
    if (outside(m.zM, lengthM)) continue;
    const same = out.find((o) => Math.abs(o.zM - m.zM) <= tol);
    if (same) same.label = `${same.label}, ${m.label}`;
    else out.push({ label: m.label, zM: m.zM });
  }
  return out;
}
