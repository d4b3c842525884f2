import { describe, expect, it } from 'vitest';
import { screenResonance } from '../../../src/physics/excitation/screen';
import type { CheckResult, ScreeningResult } from '../../../src/physics/excitation/results';
import type { ScreeningInput } from '../../../src/physics/excitation/types';
import { expectClose } from '../../helpers/expect-close';
import { linearMode, pileCase } from './fixtures';

// Ranges under test: DNV-RP-C205 §9 (docs/sources.md §S6.1): in-line 1.0 ≤ V_R ≤ 4.5 when K_S ≤ 1.8,
// cross-flow 3.0 ≤ V_R ≤ 16; ranges are closed. Standard pile: D = 1 m, mode evaluated at the waterline.

function check(r: ScreeningResult, kind: CheckResult['kind'], mode = 0): CheckResult {
  const c = r.modes[mode].checks.find((x) => x.kind === kind);
  if (!c) throw new Error(`no ${kind} check`);
  return c;
}

/** Case whose evaluation point has V_R exactly `vr` (U = vr · f · D), with awkward f and D. */
function caseAtReducedVelocity(vr: number, extra: Partial<ScreeningInput> = {}): ScreeningInput {
  const f = 0.37;
  const d = 0.61;
  return pileCase(f, vr * f * d, { zones: [{ fromM: 0, toM: 15, section: { kind: 'circle', outerDiameterM: d } }], ...extra });
}

describe('in-line and cross-flow VIV screens (DNV-RP-C205 §9)', () => {
  it('V_R exactly 1.0 and 4.5 are inside the in-line range; just outside is close', () => {
    for (const vr of [1.0, 4.5]) {
      const c = check(screenResonance(caseAtReducedVelocity(vr)), 'in-line-viv');
      expect(c.verdict, `V_R = ${vr}`).toBe('inside-band');
      expect(c.marginPercent).toBe(0);
    }
    expect(check(screenResonance(caseAtReducedVelocity(1.0 * (1 - 1e-6))), 'in-line-viv').verdict).toBe('close');
    expect(check(screenResonance(caseAtReducedVelocity(4.5 * (1 + 1e-6))), 'in-line-viv').verdict).toBe('close');
  });

  it('V_R exactly 3.0 and 16 are inside the cross-flow range; just outside is close', () => {
    for (const vr of [3.0, 16]) {
      expect(check(screenResonance(caseAtReducedVelocity(vr)), 'cross-flow-viv').verdict, `V_R = ${vr}`).toBe('inside-band');
    }
    expect(check(screenResonance(caseAtReducedVelocity(3.0 * (1 - 1e-6))), 'cross-flow-viv').verdict).toBe('close');
    expect(check(screenResonance(caseAtReducedVelocity(16 * (1 + 1e-6))), 'cross-flow-viv').verdict).toBe('close');
  });

  it('reports V_R, U and D used at the evaluation point', () => {
    const r = screenResonance(pileCase(0.5, 1.25));
    const p = r.modes[0].shedding;
    expect(p).not.toBeNull();
    // V_R = 1.25 / (0.5 × 1) = 2.5 (hand calculation); waterline of the standard pile at z = 15 m.
    expectClose(p!.reducedVelocity, 2.5, { rtol: 1e-12, label: 'V_R' });
    expect(p!.atZM).toBe(15);
    expect(p!.flowSpeedMPerS).toBe(1.25);
    expect(p!.characteristicSizeM).toBe(1);
  });

  it('below onset, the margin is how much the current may still rise: U_crit / U − 1', () => {
    // Wetmode margin rule (verdict.ts); 20 % separation is common practice, no source.
    const f = 0.5;
    const uCrit = 1.0 * f * 1; // in-line onset V_R = 1.0 (DNV-RP-C205 §9)
    const clear = check(screenResonance(pileCase(f, uCrit / 1.25)), 'in-line-viv');
    expectClose(clear.marginPercent!, 25, { rtol: 1e-9, label: 'margin at U = U_crit/1.25' });
    expect(clear.verdict).toBe('clear');
    const exactly = check(screenResonance(pileCase(f, uCrit / 1.2)), 'in-line-viv');
    expect(exactly.verdict).toBe('clear'); // exactly 20 % meets a 20 % requirement
    expect(check(screenResonance(pileCase(f, uCrit / 1.19)), 'in-line-viv').verdict).toBe('close');
  });

  it('K_S exactly 1.8 still allows in-line VIV; just above, in-line is clear at any speed', () => {
    // K_S = 4π m_e ζ/(ρD²) ≤ 1.8 (DNV-RP-C205 §9). Solve m_e for K_S = 1.8 with ρ = 1025, ζ = 0.005, D = 1.
    const mAt = (ks: number) => (ks * 1025 * 1 * 1) / (4 * Math.PI * 0.005);
    const at = screenResonance(pileCase(0.5, 1.0, { effectiveMassKgPerM: mAt(1.8) }));
    expectClose(at.modes[0].shedding!.stabilityParameter, 1.8, { rtol: 1e-12, label: 'K_S' });
    expect(check(at, 'in-line-viv').verdict).toBe('inside-band');
    const above = check(screenResonance(pileCase(0.5, 1.0, { effectiveMassKgPerM: mAt(1.8 * 1.001) })), 'in-line-viv');
    expect(above).toMatchObject({ verdict: 'clear', marginPercent: null, criticalSpeedMPerS: null });
    expect(above.reason).toMatch(/K_S = 1\.8\d* > 1\.8/);
  });

  it('a per-mode effective mass overrides the case value for K_S', () => {
    const input = pileCase(0.5, 1.0);
    input.modes[0].effectiveMassKgPerM = 1e6;
    expect(check(screenResonance(input), 'in-line-viv').verdict).toBe('clear');
    expect(screenResonance(input).modes[0].shedding!.effectiveMassKgPerM).toBe(1e6);
  });

  it('zero current: not excited, no NaN, margin null, but the critical speed is still given', () => {
    const r = screenResonance(pileCase(0.5, 0));
    for (const kind of ['in-line-viv', 'cross-flow-viv'] as const) {
      const c = check(r, kind);
      expect(c.verdict).toBe('clear');
      expect(c.marginPercent).toBeNull();
      expect(c.reason).toMatch(/not excited by shedding: zero flow speed/);
    }
    // U_crit = V_R,min · f_n · D: 1.0 × 0.5 × 1 and 3.0 × 0.5 × 1 (DNV-RP-C205 §9 onsets, hand calculation).
    expectClose(check(r, 'in-line-viv').criticalSpeedMPerS!, 0.5, { rtol: 1e-12, label: 'in-line U_crit' });
    expectClose(check(r, 'cross-flow-viv').criticalSpeedMPerS!, 1.5, { rtol: 1e-12, label: 'cross-flow U_crit' });
    expect(r.modes[0].shedding!.reynoldsNumber).toBe(0);
    expect(r.modes[0].shedding!.sheddingFrequencyHz).toBe(0);
  });

  it('a mode with no submerged length is not excited by shedding and says why', () => {
    for (const zones of [[], [{ fromM: 30, toM: 40, section: { kind: 'circle' as const, outerDiameterM: 1 } }]]) {
      const r = screenResonance(pileCase(0.5, 1.0, { zones }));
      expect(r.modes[0].shedding).toBeNull();
      expect(r.modes[0].notSubmergedReason).toMatch(/no submerged length/);
      for (const kind of ['in-line-viv', 'cross-flow-viv'] as const) {
        expect(check(r, kind)).toMatchObject({ verdict: 'clear', marginPercent: null, criticalSpeedMPerS: null });
      }
    }
  });

  it('critical speed round trip: at U_crit the mode is inside the band, just below it is not', () => {
    const f = 0.83;
    const base = screenResonance(pileCase(f, 0.1));
    for (const kind of ['in-line-viv', 'cross-flow-viv'] as const) {
      const uCrit = check(base, kind).criticalSpeedMPerS!;
      expect(check(screenResonance(pileCase(f, uCrit)), kind).verdict, kind).toBe('inside-band');
      expect(check(screenResonance(pileCase(f, uCrit * (1 - 1e-6))), kind).verdict, kind).not.toBe('inside-band');
    }
  });

  it('with a current profile, scaling the whole profile by U_crit / U at the evaluation point reaches onset', () => {
    const profile = [
      { zM: 0, speedMPerS: 0.05 },
      { zM: 7.5, speedMPerS: 0.2 },
      { zM: 15, speedMPerS: 0.3 },
    ];
    const input = pileCase(0.7, profile);
    const r = screenResonance(input);
    const c = check(r, 'cross-flow-viv');
    const k = c.criticalSpeedMPerS! / r.modes[0].shedding!.flowSpeedMPerS;
    const scaled = (s: number) => profile.map((p) => ({ zM: p.zM, speedMPerS: p.speedMPerS * s }));
    expect(check(screenResonance({ ...input, flowSpeedMPerS: scaled(k) }), 'cross-flow-viv').verdict).toBe('inside-band');
    expect(check(screenResonance({ ...input, flowSpeedMPerS: scaled(k * 0.999) }), 'cross-flow-viv').verdict).toBe('close');
  });

  it('as the current rises, the cross-flow verdict passes clear → close → inside → close → clear, never skipping (property)', () => {
    const seq: string[] = [];
    for (let u = 0.01; u < 15; u *= 1.01) {
      const v = check(screenResonance(pileCase(0.5, u)), 'cross-flow-viv').verdict;
      if (seq[seq.length - 1] !== v) seq.push(v);
    }
    expect(seq).toEqual(['clear', 'close', 'inside-band', 'close', 'clear']);
  });

  it('verdicts depend on V_R only: scaling U and f_n together changes nothing but the critical speed (property)', () => {
    const a = screenResonance(pileCase(0.4, 1.1));
    const b = screenResonance({ ...pileCase(0.4 * 7, 1.1 * 7) });
    for (const kind of ['in-line-viv', 'cross-flow-viv'] as const) {
      expect(check(b, kind).verdict).toBe(check(a, kind).verdict);
      expectClose(check(b, kind).marginPercent!, check(a, kind).marginPercent!, { rtol: 1e-9, label: kind });
      expectClose(check(b, kind).criticalSpeedMPerS!, 7 * check(a, kind).criticalSpeedMPerS!, { rtol: 1e-12, label: 'U_crit' });
    }
  });

  it('edited limits are used and carry their source; a missing source reads "entered by user"', () => {
    const input = caseAtReducedVelocity(3.5, { limits: { crossFlowReducedVelocity: { min: 4, max: 12 } } });
    const r = screenResonance(input);
    expect(check(r, 'cross-flow-viv').verdict).toBe('close');
    expect(check(r, 'cross-flow-viv').source).toBe('entered by user');
    expect(r.limits.crossFlowReducedVelocity).toEqual({ min: 4, max: 12, source: 'entered by user' });
    expect(r.limits.inLineReducedVelocity.source).toContain('DNV-RP-C205 §9');
  });

  it('a rectangle uses its width across the flow as D and flags the circular-cylinder ranges as indicative', () => {
    const r = screenResonance(
      pileCase(2, 1, {
        modes: [linearMode(2)],
        zones: [{ fromM: 0, toM: 15, section: { kind: 'rectangle', widthAcrossFlowM: 0.25, depthAlongFlowM: 0.01 } }],
      }),
    );
    expect(r.modes[0].shedding!.characteristicSizeM).toBe(0.25);
    expect(check(r, 'cross-flow-viv').reason).toMatch(/indication/);
    expect(r.notes.join(' ')).toMatch(/circular cylinders/);
  });
});
