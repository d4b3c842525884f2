import { describe, expect, it } from 'vitest';
import { flowSpeedAt, flowSpeedRange } from '../../../src/physics/excitation/profile';
import { expectClose } from '../../helpers/expect-close';

// Linear interpolation (classical); rtol 1e-12 covers rounding of one interpolation.
const profile = [
  { zM: 0, speedMPerS: 0.2 }, // near bed
  { zM: 10, speedMPerS: 0.8 }, // mid-depth
  { zM: 20, speedMPerS: 1.2 }, // surface
];

describe('flow-speed profile along the member', () => {
  it('a single value is uniform', () => {
    expect(flowSpeedAt(0.7, -5)).toBe(0.7);
    expect(flowSpeedRange(0.7, 0, 30)).toEqual({ minMPerS: 0.7, maxMPerS: 0.7 });
  });

  it('interpolates linearly between points and reproduces the points', () => {
    for (const p of profile) expect(flowSpeedAt(profile, p.zM)).toBe(p.speedMPerS);
    // Linear interpolation between the given points (exact arithmetic; the profile rule is ours, no source).
    expectClose(flowSpeedAt(profile, 5), 0.5, { rtol: 1e-12, label: 'bed–mid midpoint' });
    expectClose(flowSpeedAt(profile, 17.5), 1.1, { rtol: 1e-12, label: 'mid–surface' });
  });

  it('holds the end values beyond the first and last point', () => {
    expect(flowSpeedAt(profile, -3)).toBe(0.2);
    expect(flowSpeedAt(profile, 25)).toBe(1.2);
  });

  it('finds extremes at interior profile points, not only at interval ends', () => {
    const peaked = [
      { zM: 0, speedMPerS: 0.1 },
      { zM: 5, speedMPerS: 2 },
      { zM: 10, speedMPerS: 0.1 },
    ];
    expect(flowSpeedRange(peaked, 1, 9)).toEqual({ minMPerS: flowSpeedAt(peaked, 1), maxMPerS: 2 });
    expect(flowSpeedRange(profile, 2, 12).maxMPerS).toBeCloseTo(flowSpeedAt(profile, 12), 12);
  });
});
