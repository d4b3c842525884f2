import { describe, expect, it } from 'vitest';
import { machineryLines } from '../../../src/physics/excitation/machinery';
import { screenResonance } from '../../../src/physics/excitation/screen';
import type { CheckResult } from '../../../src/physics/excitation/results';
import type { Machine } from '../../../src/physics/excitation/types';
import { expectClose } from '../../helpers/expect-close';
import { linearMode, pileCase } from './fixtures';

// Orders f = k·rpm/60, blade pass = blades·rpm/60 (classical). Separation ±20 %: common practice, no source.

function machineryChecks(f: number, machine: Machine, extra = {}): CheckResult[] {
  return screenResonance(pileCase(f, 0, { machinery: [machine], ...extra })).modes[0].checks.filter((c) => c.kind === 'machinery');
}

describe('machinery orders', () => {
  it('lists shaft orders 1× and 2× by default and blade pass when blades are given', () => {
    const lines = machineryLines({ label: 'pump P-1', shaftSpeedHz: 10, bladeCount: 5 }, 0);
    expect(lines.map((l) => [l.label, l.lowHz])).toEqual([
      ['pump P-1 1× shaft', 10],
      ['pump P-1 2× shaft', 20],
      ['pump P-1 blade pass 1× (5 blades)', 50],
    ]);
  });

  it('a mode exactly 20 % above or below an order is clear; inside ±20 % is close; on the order is inside band', () => {
    const m: Machine = { shaftSpeedHz: 10, shaftOrders: [1] }; // 10 Hz
    expect(machineryChecks(12, m)[0].verdict).toBe('clear');
    expect(machineryChecks(8, m)[0].verdict).toBe('clear');
    expectClose(machineryChecks(12, m)[0].marginPercent!, 20, { rtol: 1e-9, label: '+20 %' });
    expectClose(machineryChecks(8, m)[0].marginPercent!, 20, { rtol: 1e-9, label: '−20 %' });
    expect(machineryChecks(11.9, m)[0].verdict).toBe('close');
    expect(machineryChecks(8.1, m)[0].verdict).toBe('close');
    expect(machineryChecks(10, m)[0].verdict).toBe('inside-band');
  });

  it('blade pass at 45 Hz against a 50 Hz forcing is 10 % below: close; resonant shaft speed is 540 rpm', () => {
    const c = machineryChecks(45, { shaftSpeedHz: 10, bladeCount: 5, shaftOrders: [] });
    expect(c).toHaveLength(1);
    expect(c[0].verdict).toBe('close');
    expectClose(c[0].marginPercent!, 10, { rtol: 1e-9, label: 'margin' });
    // 45 / 5 = 9 Hz = 540 rpm (hand calculation).
    expectClose(c[0].resonantShaftHz!, 9, { rtol: 1e-12, label: 'resonant shaft speed (540 rpm)' });
    expect(c[0].criticalSpeedMPerS).toBeNull();
  });

  it('a variable-speed drive forces a band of frequencies per order', () => {
    const c = machineryChecks(12, { shaftSpeedHz: 10, shaftSpeedMaxHz: 15, shaftOrders: [1] });
    expect(c[0].bandHz).toEqual({ lowHz: 10, highHz: 15 });
    expect(c[0].verdict).toBe('inside-band');
  });

  it('an edited separation margin changes the verdict and carries its source', () => {
    const c = machineryChecks(11.9, { shaftSpeedHz: 10, shaftOrders: [1] }, { limits: { separationMargin: { value: 0.1, source: 'owner spec' } } });
    expect(c[0].verdict).toBe('clear');
    expect(c[0].source).toBe('owner spec');
  });

  it('with wet-and-dry, the dry frequency is screened too and labelled', () => {
    const mode = { ...linearMode(8), dryFrequencyHz: 10 };
    const r = screenResonance(
      pileCase(8, 0, { modes: [mode], machinery: [{ shaftSpeedHz: 10, shaftOrders: [1] }], machineryAgainst: 'wet-and-dry' }),
    );
    const m = r.modes[0].checks.filter((c) => c.kind === 'machinery');
    expect(m.map((c) => [c.frequencyBasis, c.verdict])).toEqual([
      ['wet', 'clear'],
      ['dry', 'inside-band'],
    ]);
    expect(m[1].label).toMatch(/\(dry\)$/);
    expect(r.verdict).toBe('inside-band');
  });
});
