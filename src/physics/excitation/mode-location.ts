/**
 * Where a mode is evaluated for vortex shedding: the point of largest |mode shape| within the submerged
 * zones, with the flow speed U and size D there.
 *
 * Why the largest-|φ| point and not a φ²-weighted average of U and D over the submerged length:
 * - lock-in starts where the member moves most in the flow; a weighted average dilutes a strong surface
 *   current over a mode that barely moves near the bed and so delays the predicted onset;
 * - it gives one elevation, one U and one D that a surveyor can check by hand against the current profile
 *   and the drawing, and the critical speed then refers to a stated elevation;
 * - for uniform flow and section both choices agree.
 * The shape is taken as piecewise linear between nodes, so the maximum over a zone lies at a node inside it or
 * at a zone end (waterline, mudline) — those are the only candidates. Near-ties (within EDGE_RTOL) go to the
 * candidate with the largest U/D, i.e. the earliest onset as the flow rises. A point in still water (zero flow,
 * e.g. a stretch shielded inside a caisson) is taken only when no moving point has flow: the largest |φ| among
 * points with flow is the evaluation point otherwise, since still water cannot excite the mode.
 */
import type { FlowProfile } from './profile';
import { flowSpeedAt } from './profile';
import type { ScreeningMode, SubmergedZone, ZoneSection } from './types';
import { EDGE_RTOL } from './verdict';

export interface ModeLocation {
  atZM: number;
  zoneIndex: number;
  /** |φ| at atZM over max |φ| on the whole mode. */
  relativeAmplitude: number;
  flowSpeedMPerS: number;
  sizeM: number;
  section: ZoneSection;
}

export type LocateResult =
  | { ok: true; location: ModeLocation }
  | { ok: false; reason: 'no-submerged-length' | 'no-motion-under-water'; message: string };

/** D of a section: outer diameter for a circle, width across the flow for a rectangle. */
export function characteristicSizeM(section: ZoneSection): number {
  return section.kind === 'circle' ? section.outerDiameterM : section.widthAcrossFlowM;
}

/** Linear interpolation of the shape at z (z within [zM[0], zM[n-1]]); binary search on the nodes. */
function shapeAt(mode: ScreeningMode, z: number): number {
  const zs = mode.zM;
  const w = mode.displacement;
  let lo = 0;
  let hi = zs.length - 1;
  if (z <= zs[lo]) return w[lo];
  if (z >= zs[hi]) return w[hi];
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (zs[mid] <= z) lo = mid;
    else hi = mid;
  }
  const t = (z - zs[lo]) / (zs[hi] - zs[lo]);
  return w[lo] + t * (w[hi] - w[lo]);
}

export function locateModeInFlow(mode: ScreeningMode, zones: readonly SubmergedZone[], profile: FlowProfile): LocateResult {
  const n = mode.zM.length;
  let maxAll = 0;
  for (let i = 0; i < n; i++) maxAll = Math.max(maxAll, Math.abs(mode.displacement[i]));
  const zFirst = mode.zM[0];
  const zLast = mode.zM[n - 1];

  let best: ModeLocation | null = null;
  let bestAmp = 0;
  let overlaps = false;
  for (let zi = 0; zi < zones.length; zi++) {
    const zone = zones[zi];
    const a = Math.max(zone.fromM, zFirst);
    const b = Math.min(zone.toM, zLast);
    if (!(b > a)) continue; // no overlap of positive length with the mode's span
    overlaps = true;
    const d = characteristicSizeM(zone.section);
    // Candidates: the zone ends (shape interpolated there) and the nodes strictly inside; k = -1 is the lower
    // end, k = n the upper end, no allocation per candidate.
    for (let k = -1; k <= n; k++) {
      let z: number;
      let amp: number;
      if (k === -1) {
        z = a;
        amp = Math.abs(shapeAt(mode, a));
      } else if (k === n) {
        z = b;
        amp = Math.abs(shapeAt(mode, b));
      } else {
        z = mode.zM[k];
        if (!(z > a && z < b)) continue;
        amp = Math.abs(mode.displacement[k]);
      }
      const u = zone.flowSpeedMPerS ?? flowSpeedAt(profile, z);
      // Still water cannot excite: a moving point with flow beats any point without (a riser shielded in a
      // caisson over its upper bays still sheds where its lower bays stand in the current).
      const excitable = u > 0 && amp > 0;
      const flowBeats = best !== null && excitable !== (best.flowSpeedMPerS > 0 && bestAmp > 0);
      const tie = best !== null && Math.abs(amp - bestAmp) <= EDGE_RTOL * Math.max(amp, bestAmp);
      const better = best === null || (flowBeats ? excitable : tie ? u / d > best.flowSpeedMPerS / best.sizeM : amp > bestAmp);
      if (better) {
        bestAmp = flowBeats ? amp : Math.max(bestAmp, amp);
        best = { atZM: z, zoneIndex: zi, relativeAmplitude: amp / maxAll, flowSpeedMPerS: u, sizeM: d, section: zone.section };
      }
    }
  }

  if (!overlaps) {
    return {
      ok: false,
      reason: 'no-submerged-length',
      message: 'not excited by shedding: the mode has no submerged length (no submerged zone overlaps it)',
    };
  }
  if (best === null || bestAmp <= 0) {
    return {
      ok: false,
      reason: 'no-motion-under-water',
      message: 'not excited by shedding: the mode does not move within the submerged length',
    };
  }
  return { ok: true, location: best };
}

/**
 * Where shedding is fastest along the submerged zones the mode spans: the zone end with the highest U/D, hence
 * the highest f_s = St·U/D (St taken as equal between candidates). For the stem screen f_s/f_n, which asks
 * whether shedding anywhere on the stem reaches the natural frequency: on a stem that tapers to its tip this is
 * the tip; where the root is slimmer (or the tip is shielded) the root governs. Null when no zone has flow.
 */
export function fastestSheddingLocation(mode: ScreeningMode, zones: readonly SubmergedZone[], profile: FlowProfile): ModeLocation | null {
  const n = mode.zM.length;
  let maxAll = 0;
  for (let i = 0; i < n; i++) maxAll = Math.max(maxAll, Math.abs(mode.displacement[i]));
  let best: ModeLocation | null = null;
  for (let zi = 0; zi < zones.length; zi++) {
    const zone = zones[zi];
    const a = Math.max(zone.fromM, mode.zM[0]);
    const b = Math.min(zone.toM, mode.zM[n - 1]);
    if (!(b > a)) continue;
    const d = characteristicSizeM(zone.section);
    for (const z of [a, b]) {
      const u = zone.flowSpeedMPerS ?? flowSpeedAt(profile, z);
      if (!(u > 0)) continue;
      if (best === null || u / d > (best.flowSpeedMPerS / best.sizeM) * (1 + EDGE_RTOL)) {
        best = { atZM: z, zoneIndex: zi, relativeAmplitude: maxAll > 0 ? Math.abs(shapeAt(mode, z)) / maxAll : 0, flowSpeedMPerS: u, sizeM: d, section: zone.section };
      }
    }
  }
  return best;
}
