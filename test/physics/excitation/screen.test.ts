import { describe, expect, it } from 'vitest';
import { DEFAULT_DAMPING, DEFAULT_LIMITS, SEAWATER } from '../../../src/physics/excitation/defaults';
import { screenResonance } from '../../../src/physics/excitation/screen';
import type { ScreeningInput } from '../../../src/physics/excitation/types';
import { seeded } from '../../bench/timing';
import { expectClose } from '../../helpers/expect-close';
import { linearMode, pileCase } from './fixtures';

describe('case verdict and result contents', () => {
  it('the case verdict is the worst over modes and excitations, and names the mode and excitation driving it', () => {
    // Mode 0 at 3 Hz: clear of everything. Mode 1 at 11 Hz: close to the 10 Hz shaft line (common practice ±20 %).
    // Mode 2 at 0.1 Hz with U = 0.5, D = 1: V_R = 5, inside cross-flow 3–16 (DNV-RP-C205 §9).
    const input = pileCase(3, 0.5, {
      modes: [linearMode(3), linearMode(11), linearMode(0.1)],
      machinery: [{ label: 'fan F-2', shaftSpeedHz: 10, shaftOrders: [1] }],
    });
    const r = screenResonance(input);
    expect(r.modes.map((m) => m.verdict)).toEqual(['clear', 'close', 'inside-band']);
    expect(r.verdict).toBe('inside-band');
    expect(r.driver).toMatchObject({ modeIndex: 2, kind: 'cross-flow-viv' });
    expect(r.modes[2].checks[r.driver!.checkIndex].kind).toBe('cross-flow-viv');
  });

  it('between equal verdicts the smaller margin drives, and between equal margins the lower mode', () => {
    // Mode 0: 5 % from the 10 Hz line; mode 1: 15 % from it; both close.
    const twoClose = pileCase(10.5, 0, {
      modes: [linearMode(11.5), linearMode(10.5)],
      machinery: [{ shaftSpeedHz: 10, shaftOrders: [1] }],
    });
    expect(screenResonance(twoClose).driver).toMatchObject({ modeIndex: 1 });
    const same = pileCase(10.5, 0, { modes: [linearMode(10.5), linearMode(10.5)], machinery: [{ shaftSpeedHz: 10, shaftOrders: [1] }] });
    expect(screenResonance(same).driver).toMatchObject({ modeIndex: 0 });
  });

  it('a case with only unreachable checks is clear and still names a driver', () => {
    const r = screenResonance(pileCase(1, 0));
    expect(r.verdict).toBe('clear');
    expect(r.driver).not.toBeNull();
  });

  it('defaults come with their sources: seawater, damping, DNV-RP-C205 §9 limits, ±20 % margin', () => {
    const r = screenResonance(pileCase(1, 0.3));
    expect(r.liquid).toEqual(SEAWATER);
    expect(r.liquid.densityKgPerM3).toBe(1025); // seawater, common design value (docs/sources.md §S7)
    expect(r.damping).toEqual({ ratio: DEFAULT_DAMPING.ratio, source: DEFAULT_DAMPING.source });
    expect(r.limits).toEqual(DEFAULT_LIMITS);
    // DNV-RP-C205 §9 and common practice, docs/sources.md §S6.
    expect(r.limits.inLineReducedVelocity).toMatchObject({ min: 1.0, max: 4.5 });
    expect(r.limits.inLineStabilityMax.value).toBe(1.8);
    expect(r.limits.crossFlowReducedVelocity).toMatchObject({ min: 3.0, max: 16 });
    expect(r.limits.stemFrequencyRatioMax.value).toBe(0.8);
    expect(r.limits.separationMargin.value).toBe(0.2);
    expect(r.notes.join(' ')).toMatch(/Damping not given/);
    for (const c of r.modes[0].checks) expect(c.source.length).toBeGreaterThan(10);
  });

  it('per zone it gives the shedding-frequency band over the zone’s speed range', () => {
    // Profile 0.2 m/s at bed to 1.0 m/s at z = 15; D = 1 m, ν = 1.19e-6: Re ≤ 8.4×10⁵ (critical band 0.2–0.27).
    // Low edge 0.2 × 0.2 / 1 = 0.04 Hz; high edge 0.27 × 1.0 / 1 = 0.27 Hz (hand calculation, St per strouhal.ts).
    const r = screenResonance(pileCase(1, [
      { zM: 0, speedMPerS: 0.2 },
      { zM: 15, speedMPerS: 1.0 },
    ]));
    const z = r.zones[0];
    expectClose(z.sheddingFrequencyLowHz, 0.04, { rtol: 1e-12, label: 'low edge' });
    expectClose(z.sheddingFrequencyHighHz, 0.27, { rtol: 1e-12, label: 'high edge' });
    expect(z.strouhal.regime).toBe('critical');
  });

  it('returns finite numbers or null everywhere for random valid inputs (property)', () => {
    const rnd = seeded(20240607);
    const bad: string[] = [];
    const walk = (v: unknown, path: string): void => {
      if (typeof v === 'number' && !Number.isFinite(v)) bad.push(`${path} = ${v}`);
      else if (v && typeof v === 'object') for (const [k, x] of Object.entries(v)) walk(x, `${path}.${k}`);
    };
    for (let t = 0; t < 200; t++) {
      const length = 1 + 50 * rnd();
      const modes = Array.from({ length: 1 + Math.floor(4 * rnd()) }, () => {
        const zM = Array.from({ length: 11 }, (_, i) => (length * i) / 10);
        return { wetFrequencyHz: 0.05 + 200 * rnd(), zM, displacement: zM.map((z) => Math.sin((1 + 3 * rnd()) * z) + 0.01) };
      });
      const wl = length * rnd();
      const input: ScreeningInput = {
        modes,
        zones: rnd() < 0.1 ? [] : [{ fromM: 0, toM: Math.max(wl, 1e-3), section: { kind: 'circle', outerDiameterM: 0.01 + 3 * rnd() } }],
        flowSpeedMPerS: rnd() < 0.2 ? 0 : [
          { zM: 0, speedMPerS: 2 * rnd() },
          { zM: length, speedMPerS: 3 * rnd() },
        ],
        effectiveMassKgPerM: 1 + 5000 * rnd(),
        dampingRatio: rnd() < 0.2 ? 0 : 0.02 * rnd(),
        stemFrequencyRatioScreen: rnd() < 0.5,
        waves: { periodMinS: 2 + 3 * rnd(), periodMaxS: 6 + 10 * rnd() },
        machinery: [{ shaftSpeedHz: (100 + 3000 * rnd()) / 60, bladeCount: 3 + Math.floor(5 * rnd()) }],
      };
      walk(screenResonance(input), `case ${t}`);
    }
    expect(bad).toEqual([]);
  });

  it('does not change its input (the UI keeps the case object)', () => {
    const input = pileCase(0.5, 1.0, { machinery: [{ shaftSpeedHz: 10 }], limits: { separationMargin: { value: 0.15 } } });
    const before = JSON.stringify(input);
    screenResonance(input);
    expect(JSON.stringify(input)).toBe(before);
  });

  it('zones listed in any order give the same result apart from zone indices (property)', () => {
    const zones = [
      { fromM: 0, toM: 8, section: { kind: 'circle' as const, outerDiameterM: 1.0 } },
      { fromM: 8, toM: 15, section: { kind: 'circle' as const, outerDiameterM: 1.2 } },
    ];
    const a = screenResonance(pileCase(0.3, 1.2, { zones }));
    const b = screenResonance(pileCase(0.3, 1.2, { zones: [zones[1], zones[0]] }));
    expect(b.modes[0].checks.map((c) => [c.verdict, c.marginPercent])).toEqual(a.modes[0].checks.map((c) => [c.verdict, c.marginPercent]));
    expect(b.modes[0].shedding!.atZM).toBe(a.modes[0].shedding!.atZM);
  });
});
