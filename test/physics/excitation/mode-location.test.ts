import { describe, expect, it } from 'vitest';
import { locateModeInFlow } from '../../../src/physics/excitation/mode-location';
import type { ScreeningMode, SubmergedZone } from '../../../src/physics/excitation/types';
import { expectClose } from '../../helpers/expect-close';
import { linearMode } from './fixtures';

const circle = (d: number) => ({ kind: 'circle' as const, outerDiameterM: d });

describe('where a mode is evaluated for shedding', () => {
  it('is the waterline for a cantilever-like mode with the top out of the water, shape interpolated there', () => {
    // φ = z/20 on nodes every 1 m; waterline at 12.5 m falls between nodes: |φ| = 0.625 by linear interpolation.
    const zones: SubmergedZone[] = [{ fromM: 0, toM: 12.5, section: circle(1) }];
    const r = locateModeInFlow(linearMode(1), zones, 0.5);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.location.atZM).toBe(12.5);
    expectClose(r.location.relativeAmplitude, 0.625, { rtol: 1e-12, label: 'interpolated |φ|' });
    expect(r.location.flowSpeedMPerS).toBe(0.5);
    expect(r.location.sizeM).toBe(1);
  });

  it('takes the flow speed from the profile and D from the zone at that point', () => {
    const zones: SubmergedZone[] = [
      { fromM: 0, toM: 10, section: circle(1.2) },
      { fromM: 10, toM: 15, section: circle(1.4) }, // marine growth zone near the surface
    ];
    const profile = [
      { zM: 0, speedMPerS: 0.2 },
      { zM: 15, speedMPerS: 1.0 },
    ];
    const r = locateModeInFlow(linearMode(1), zones, profile);
    if (!r.ok) throw new Error(r.message);
    expect(r.location).toMatchObject({ atZM: 15, zoneIndex: 1, flowSpeedMPerS: 1.0, sizeM: 1.4 });
  });

  it('finds an interior antinode of a pinned–pinned-like mode', () => {
    const zM = Array.from({ length: 41 }, (_, i) => i * 0.5);
    const mode: ScreeningMode = { wetFrequencyHz: 1, zM, displacement: zM.map((z) => Math.sin((Math.PI * z) / 20)) };
    const r = locateModeInFlow(mode, [{ fromM: 0, toM: 20, section: circle(1) }], 1);
    if (!r.ok) throw new Error(r.message);
    expect(r.location.atZM).toBe(10);
    expect(r.location.relativeAmplitude).toBe(1);
  });

  it('is unchanged by the sign and scale of the mode shape (property)', () => {
    const zones: SubmergedZone[] = [{ fromM: 2, toM: 13, section: circle(0.8) }];
    const m = linearMode(1);
    const scaled: ScreeningMode = { ...m, displacement: Array.from(m.displacement, (w) => -37.5 * w) };
    expect(locateModeInFlow(scaled, zones, 0.3)).toEqual(locateModeInFlow(m, zones, 0.3));
  });

  it('breaks near-ties towards the larger U/D (earliest onset)', () => {
    // Symmetric mode: equal |φ| at z = 5 and z = 15; the faster current is at z = 15.
    const zM = [0, 5, 10, 15, 20];
    const mode: ScreeningMode = { wetFrequencyHz: 1, zM, displacement: [0, 1, 0, -1, 0] };
    const profile = [
      { zM: 0, speedMPerS: 0.1 },
      { zM: 20, speedMPerS: 0.9 },
    ];
    const r = locateModeInFlow(mode, [{ fromM: 0, toM: 20, section: circle(1) }], profile);
    if (!r.ok) throw new Error(r.message);
    expect(r.location.atZM).toBe(15);
  });

  it('reports no submerged length when no zone overlaps the mode', () => {
    const r = locateModeInFlow(linearMode(1), [{ fromM: 25, toM: 30, section: circle(1) }], 1);
    expect(r).toMatchObject({ ok: false, reason: 'no-submerged-length' });
    expect(locateModeInFlow(linearMode(1), [], 1)).toMatchObject({ ok: false, reason: 'no-submerged-length' });
    // Touching at a single point is no length either.
    expect(locateModeInFlow(linearMode(1), [{ fromM: 20, toM: 22, section: circle(1) }], 1)).toMatchObject({ ok: false });
  });

  it('reports no motion under water when the shape is zero over the submerged length', () => {
    const mode: ScreeningMode = { wetFrequencyHz: 1, zM: [0, 5, 10, 20], displacement: [0, 0, 0, 1] };
    expect(locateModeInFlow(mode, [{ fromM: 0, toM: 10, section: circle(1) }], 1)).toMatchObject({
      ok: false,
      reason: 'no-motion-under-water',
    });
  });
});
