/**
 * Flow-speed profile along the member axis: a single value, or points (zM, speed) in strictly increasing zM,
 * interpolated linearly between points and held constant beyond the first and last point
 * (a current profile is usually given at surface, mid-depth and near bed; beyond those we do not extrapolate).
 */
import type { FlowPoint } from './types';

export type FlowProfile = number | readonly FlowPoint[];

/** Flow speed at elevation zM, m/s. */
export function flowSpeedAt(profile: FlowProfile, zM: number): number {
  if (typeof profile === 'number') return profile;
  const n = profile.length;
  if (zM <= profile[0].zM) return profile[0].speedMPerS;
  if (zM >= profile[n - 1].zM) return profile[n - 1].speedMPerS;
  let i = 1;
  while (profile[i].zM < zM) i++;
  const a = profile[i - 1];
  const b = profile[i];
  const t = (zM - a.zM) / (b.zM - a.zM);
  return a.speedMPerS + t * (b.speedMPerS - a.speedMPerS);
}

/**
 * Lowest and highest flow speed over [fromM, toM], m/s. A piecewise-linear profile takes its extremes at the
 * interval ends or at profile points inside the interval, so those are the only candidates.
 */
export function flowSpeedRange(profile: FlowProfile, fromM: number, toM: number): { minMPerS: number; maxMPerS: number } {
  let lo = Math.min(flowSpeedAt(profile, fromM), flowSpeedAt(profile, toM));
  let hi = Math.max(flowSpeedAt(profile, fromM), flowSpeedAt(profile, toM));
  if (typeof profile !== 'number') {
    for (const p of profile) {
      if (p.zM > fromM && p.zM < toM) {
        lo = Math.min(lo, p.speedMPerS);
        hi = Math.max(hi, p.speedMPerS);
      }
    }
  }
  return { minMPerS: lo, maxMPerS: hi };
}
