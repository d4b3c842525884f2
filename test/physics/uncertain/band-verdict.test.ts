import { describe, expect, it } from 'vitest';
import { screenResonance } from '../../../src/physics/excitation';
import type { ScreeningInput } from '../../../src/physics/excitation';
import { memberBand } from '../../../src/physics/uncertain/band';
import { screenBand } from '../../../src/physics/uncertain/band-screening';
import { judgeOverBand, switchText } from '../../../src/physics/uncertain/band-verdict';
import { expectClose } from '../../helpers/expect-close';
import { uniformMember, uniformProps } from '../beam/fixtures';

/** A screening of typed-in frequencies against one machine line at 10 Hz (no flow). */
function screenAt(fHz: number) {
  const input: ScreeningInput = {
    modes: [{ wetFrequencyHz: fHz, zM: [0, 1], displacement: [0, 1] }],
    zones: [],
    flowSpeedMPerS: 0,
    effectiveMassKgPerM: 100,
    machinery: [{ label: 'pump', shaftSpeedHz: 10, shaftOrders: [1] }],
  };
  return screenResonance(input);
}

const machineCheck = (v: ReturnType<typeof judgeOverBand>) => v.checks.find((c) => c.kind === 'machinery')!;

describe('verdict over the band', () => {
  it('a mode clear at its likely value but within the ±20 % margin somewhere over its band is close', () => {
    // Line at 10 Hz; likely 12.5 Hz (25 % above, clear); band 11.5–13 Hz reaches 15 % (close under the
    // ±20 % separation rule, common practice).
    const v = judgeOverBand(screenAt(12.5), [screenAt(11.5), screenAt(13)], () => [11.5, 13]);
    const c = machineCheck(v);
    expect(c.likely.verdict).toBe('clear');
    expect(c.band.verdict).toBe('close');
    expectClose(c.band.worstMarginPercent!, 15, { rtol: 1e-12, label: 'worst margin %' });
    expect(v.likelyVerdict).toBe('clear');
    expect(v.bandVerdict).toBe('close');
  });

  it('a band that spans the forcing line is inside band even when both ends miss it', () => {
    // Ends at 8 and 12.5 Hz both lie outside the 10 Hz line, but the band between them crosses it.
    const v = judgeOverBand(screenAt(12.5), [screenAt(8), screenAt(12.5)], () => [8, 12.5]);
    expect(machineCheck(v).band.verdict).toBe('inside-band');
  });

  it('a whole band beyond the margin stays clear', () => {
    const v = judgeOverBand(screenAt(13), [screenAt(12.5), screenAt(14)], () => [12.5, 14]);
    expect(machineCheck(v).band.verdict).toBe('clear');
  });

  it('finds the tip mass at which a cantilever stops clearing a machine by 20 %, matching the tip-mass equation', () => {
    const L = 10;
    const { ei, m } = uniformProps();
    const model = uniformMember(L, [{ atM: 0, kind: 'clamped' }], { modes: 2, masses: [{ atM: L, massKg: m * L }] });
    const out = memberBand(model, [{ path: 'masses.0.massKg', low: 0.8 * m * L, high: 1.2 * m * L }]);
    if (!out.ok) throw new Error(out.message);
    const f1 = out.band.likely.dry.frequenciesHz[0];
    const lineHz = f1 / 1.25;
    const s = screenBand(model, out.band, { flowSpeedMPerS: 0, machinery: [{ label: 'fan', shaftSpeedHz: lineHz, shaftOrders: [1] }] });
    if (!s.ok) throw new Error(s.message);
    const c = machineCheck(s.verdict);
    expect(c.modeIndex).toBe(0);
    expect(c.likely.verdict).toBe('clear');
    expect(c.band.verdict).toBe('close');
    expect(c.switches).toHaveLength(1);
    const sw = c.switches[0];
    expect(sw.side).toBe('above');
    // Cross-check: the tip-mass frequency equation 1 + cos λ cosh λ + μλ(cos λ sinh λ − sin λ cosh λ) = 0
    // (R.D. Blevins, Formulas for Natural Frequency and Mode Shape, Table 8-8) is linear in μ, so the μ
    // giving f1 = 1.2 × the line follows directly.
    const lam = Math.sqrt((2 * Math.PI * 1.2 * lineHz * L * L) / Math.sqrt(ei / m));
    const mu = -(1 + Math.cos(lam) * Math.cosh(lam)) / (lam * (Math.cos(lam) * Math.sinh(lam) - Math.sin(lam) * Math.cosh(lam)));
    // 2e-4: the search stops within 1e-4 of the range (0.4 m L) and the mesh adds below 1e-6.
    expectClose(sw.value, mu * m * L, { rtol: 2e-4, label: 'tip mass where the margin falls to 20 %' });
    expect(switchText(c.likely.verdict, sw)).toMatch(/^clear unless masses\.0\.massKg is above \d/);
  });
});
