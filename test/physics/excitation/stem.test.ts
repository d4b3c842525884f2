import { describe, expect, it } from 'vitest';
import { screenResonance } from '../../../src/physics/excitation/screen';
import { speedForSheddingFrequency } from '../../../src/physics/excitation/stem';
import type { CheckResult, ScreeningResult } from '../../../src/physics/excitation/results';
import { expectClose } from '../../helpers/expect-close';
import { stemCase } from './fixtures';

// Screen under test: f_s / f_n ≤ 0.8 for stems in flow — common practice (also thermowell guidance, from memory),
// docs/sources.md §S6.3. St = 0.2 subcritical (common practice; DNV-RP-C205 §9); 0.27 above (Roshko 1961 / Wetmode band).

function stem(r: ScreeningResult): CheckResult {
  const c = r.modes[0].checks.find((x) => x.kind === 'stem-frequency-ratio');
  if (!c) throw new Error('no stem check');
  return c;
}

describe('sensor-stem screen f_s / f_n ≤ 0.8', () => {
  it('f_s / f_n exactly 0.8 passes (close, margin 0); a lower f_n fails (inside band)', () => {
    // D = 20 mm, U = 2 m/s, ν = 1e-6: Re = 4×10⁴ (subcritical), f_s = 0.2 × 2 / 0.02 = 20 Hz; 20 / 0.8 = 25 Hz.
    const at = stem(screenResonance(stemCase(25, 2)));
    expect(at.verdict).toBe('close');
    expect(at.marginPercent).toBe(0);
    expect(stem(screenResonance(stemCase(24.9, 2))).verdict).toBe('inside-band');
  });

  it('is clear once f_n is 20 % above f_s / 0.8 (f_s / f_n = 0.8 / 1.2)', () => {
    // Wetmode margin rule (verdict.ts) with ±20 % common practice.
    const c = stem(screenResonance(stemCase(30, 2)));
    expect(c.verdict).toBe('clear');
    expectClose(c.marginPercent!, 20, { rtol: 1e-9, label: 'margin' });
  });

  it('critical speed is where f_s = 0.8 f_n, and the verdict flips just above it', () => {
    // U = 0.8 f_n D / St = 0.8 × 25 × 0.02 / 0.2 = 2.0 m/s (hand calculation; subcritical St).
    const c = stem(screenResonance(stemCase(25, 0.5)));
    expectClose(c.criticalSpeedMPerS!, 2.0, { rtol: 1e-12, label: 'U_crit' });
    expect(stem(screenResonance(stemCase(25, c.criticalSpeedMPerS!))).verdict).not.toBe('inside-band');
    expect(stem(screenResonance(stemCase(25, c.criticalSpeedMPerS! * (1 + 1e-6)))).verdict).toBe('inside-band');
  });

  it('when the target frequency falls in the Strouhal jump at Re = 2×10⁵, the critical speed is that boundary', () => {
    // D = 50 mm, ν = 1e-6: Re = 2×10⁵ at U = 4 m/s. f_n = 25 Hz → target f_s = 20 Hz; at 4 m/s
    // f_s = 16 Hz with St 0.2 and 21.6 Hz with St 0.27, so f_s crosses 20 Hz at the jump.
    const zones = [{ fromM: 0, toM: 0.2, section: { kind: 'circle' as const, outerDiameterM: 0.05 } }];
    const uCrit = stem(screenResonance(stemCase(25, 1, { zones }))).criticalSpeedMPerS!;
    expectClose(uCrit, 4, { rtol: 1e-12, label: 'U_crit at the regime boundary' });
    expect(stem(screenResonance(stemCase(25, 4 * (1 - 1e-6), { zones }))).verdict).toBe('clear');
    expect(stem(screenResonance(stemCase(25, 4 * (1 + 1e-6), { zones }))).verdict).toBe('inside-band');
  });

  it('speedForSheddingFrequency inverts f_s(U) in every Reynolds regime (property)', () => {
    const section = { kind: 'circle' as const, outerDiameterM: 0.3 };
    for (const target of [0.001, 0.5, 5, 50, 500]) {
      const u = speedForSheddingFrequency(target, 0.3, section, 1e-6);
      const stBelow = screenResonance(stemCase(1, u * (1 - 1e-9), { zones: [{ fromM: 0, toM: 0.2, section }] }));
      const stAbove = screenResonance(stemCase(1, u * (1 + 1e-9), { zones: [{ fromM: 0, toM: 0.2, section }] }));
      expect(stBelow.modes[0].shedding!.sheddingFrequencyHz).toBeLessThanOrEqual(target * (1 + 1e-6));
      expect(stAbove.modes[0].shedding!.sheddingFrequencyHz).toBeGreaterThanOrEqual(target * (1 - 1e-6));
    }
  });

  it('a user Strouhal number replaces the table and its source is shown', () => {
    const r = screenResonance(stemCase(25, 1, { strouhal: { value: 0.25, source: 'site measurement, fictional test rig' } }));
    // U_crit = 0.8 × 25 × 0.02 / 0.25 = 1.6 m/s (hand calculation).
    expectClose(stem(r).criticalSpeedMPerS!, 1.6, { rtol: 1e-12, label: 'U_crit with St override' });
    expect(r.modes[0].shedding!.strouhal).toMatchObject({ value: 0.25, regime: 'override' });
    expect(stem(r).source).toContain('fictional test rig');
  });

  it('zero flow gives no NaN and a stated critical speed; no check when the screen is off', () => {
    const c = stem(screenResonance(stemCase(25, 0)));
    expect(c).toMatchObject({ verdict: 'clear', marginPercent: null });
    expectClose(c.criticalSpeedMPerS!, 2.0, { rtol: 1e-12, label: 'U_crit at zero flow' });
    const off = screenResonance(stemCase(25, 2, { stemFrequencyRatioScreen: false }));
    expect(off.modes[0].checks.some((x) => x.kind === 'stem-frequency-ratio')).toBe(false);
  });

  it('an edited ratio limit is used', () => {
    const c = stem(screenResonance(stemCase(25, 2, { limits: { stemFrequencyRatioMax: { value: 0.5, source: 'project rule' } } })));
    // f_s / f_n = 20 / 25 = 0.8 > 0.5.
    expect(c.verdict).toBe('inside-band');
    expect(c.source).toContain('project rule');
  });
});
