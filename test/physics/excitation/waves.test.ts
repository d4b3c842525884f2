import { describe, expect, it } from 'vitest';
import { screenResonance } from '../../../src/physics/excitation/screen';
import type { CheckResult } from '../../../src/physics/excitation/results';
import { expectClose } from '../../helpers/expect-close';
import { pileCase } from './fixtures';

// Wave band 4–12 s → 1/12 … 1/4 Hz (classical f = 1/T). Separation ±20 %: common practice, no source.

function wave(f: number): CheckResult {
  const c = screenResonance(pileCase(f, 0, { waves: { periodMinS: 4, periodMaxS: 12 } })).modes[0].checks.find((x) => x.kind === 'waves');
  if (!c) throw new Error('no wave check');
  return c;
}

describe('wave band', () => {
  it('the band edges 1/12 Hz and 1/4 Hz are inside the band', () => {
    expect(wave(1 / 12).verdict).toBe('inside-band');
    expect(wave(0.25).verdict).toBe('inside-band');
    expect(wave(0.25).bandHz).toEqual({ lowHz: 1 / 12, highHz: 0.25 });
  });

  it('20 % above the short-period edge or below the long-period edge is clear; nearer is close', () => {
    expect(wave(0.3).verdict).toBe('clear');
    // (0.3 − 0.25) / 0.25 = 20 %: margin from the nearest band edge, ±20 % separation (common practice).
    expectClose(wave(0.3).marginPercent!, 20, { rtol: 1e-9, label: 'above band' });
    expect(wave(0.8 / 12).verdict).toBe('clear');
    expect(wave(0.29).verdict).toBe('close');
    expect(wave(0.9 / 12).verdict).toBe('close');
  });

  it('inside the band the margin is negative and names the period', () => {
    const c = wave(1 / 8);
    expect(c.verdict).toBe('inside-band');
    expect(c.marginPercent!).toBeLessThan(0);
    expect(c.reason).toMatch(/period 8 s/);
    expect(c.criticalSpeedMPerS).toBeNull();
  });
});
