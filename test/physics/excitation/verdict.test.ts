import { describe, expect, it } from 'vitest';
import { classifyFrequency, compareSeverity, VERDICT_WORDS, worstIndex } from '../../../src/physics/excitation/verdict';
import { expectClose } from '../../helpers/expect-close';

// The rule under test is Wetmode's own (verdict.ts); the ±20 % figure is common practice, no source
// (docs/sources.md §S6.4). Margins are ratios of nearby numbers: rtol 1e-9 covers rounding.
const M = 0.2;

describe('verdict rule: a mode frequency against an excitation band', () => {
  it('exactly ±20 % from a forcing line is clear, just inside ±20 % is close, on the line is inside band', () => {
    const line = { lowHz: 10, highHz: 10 };
    expect(classifyFrequency(12, line, M)).toMatchObject({ verdict: 'clear' });
    expect(classifyFrequency(8, line, M)).toMatchObject({ verdict: 'clear' });
    expectClose(classifyFrequency(12, line, M).marginPercent, 20, { rtol: 1e-9, label: '+20 %' });
    expectClose(classifyFrequency(8, line, M).marginPercent, 20, { rtol: 1e-9, label: '−20 %' });
    expect(classifyFrequency(11.99, line, M).verdict).toBe('close');
    expect(classifyFrequency(8.01, line, M).verdict).toBe('close');
    expect(classifyFrequency(10, line, M)).toEqual({ verdict: 'inside-band', marginPercent: 0 });
  });

  it('±20 % is judged exactly even when the numbers are not representable in binary', () => {
    // 0.37 × 1.2 and 0.37 × 0.8 carry rounding; EDGE_RTOL keeps them on the margin.
    const line = { lowHz: 0.37, highHz: 0.37 };
    expect(classifyFrequency(0.37 * 1.2, line, M).verdict).toBe('clear');
    expect(classifyFrequency(0.37 * 0.8, line, M).verdict).toBe('clear');
  });

  it('a closed band includes its edges; margin inside is minus the depth to the nearest edge', () => {
    const band = { lowHz: 2, highHz: 4 };
    expect(classifyFrequency(2, band, M)).toEqual({ verdict: 'inside-band', marginPercent: 0 });
    expect(classifyFrequency(4, band, M)).toEqual({ verdict: 'inside-band', marginPercent: 0 });
    // f = 2.2: 10 % above the low edge, 45 % below the high edge → −10 %.
    expectClose(classifyFrequency(2.2, band, M).marginPercent, -10, { rtol: 1e-9, label: 'depth' });
  });

  it('an open upper edge (stem screen) is not inside at equality and one-sided below', () => {
    const band = { lowHz: 0, highHz: 50, highInclusive: false };
    expect(classifyFrequency(50, band, M)).toEqual({ verdict: 'close', marginPercent: 0 });
    expect(classifyFrequency(1e-3, band, M).verdict).toBe('inside-band');
    expect(classifyFrequency(60, band, M).verdict).toBe('clear');
  });

  it('margin is continuous across a band edge and changes sign there (property)', () => {
    const band = { lowHz: 3, highHz: 7 };
    for (const edge of [3, 7]) {
      const below = classifyFrequency(edge * (1 - 1e-6), band, M).marginPercent;
      const above = classifyFrequency(edge * (1 + 1e-6), band, M).marginPercent;
      expect(Math.abs(below)).toBeLessThan(1e-3);
      expect(Math.abs(above)).toBeLessThan(1e-3);
      expect(Math.sign(below)).toBe(-Math.sign(above));
    }
  });

  it('a zero separation margin makes everything outside the band clear', () => {
    expect(classifyFrequency(10.0001, { lowHz: 10, highHz: 10 }, 0).verdict).toBe('clear');
  });
});

describe('worst-of ordering', () => {
  it('inside band is worse than close, close worse than clear; ties go to the smaller margin', () => {
    const clear = { verdict: 'clear' as const, marginPercent: 50 };
    const close = { verdict: 'close' as const, marginPercent: 5 };
    const inside = { verdict: 'inside-band' as const, marginPercent: -1 };
    const deeper = { verdict: 'inside-band' as const, marginPercent: -30 };
    expect(compareSeverity(inside, close)).toBeLessThan(0);
    expect(compareSeverity(close, clear)).toBeLessThan(0);
    expect(compareSeverity(deeper, inside)).toBeLessThan(0);
    expect(worstIndex([clear, close, inside, deeper, clear])).toBe(3);
    expect(worstIndex([])).toBe(-1);
  });

  it('a check that cannot be reached (null margin) ranks below any clear check with a margin', () => {
    const unreachable = { verdict: 'clear' as const, marginPercent: null };
    const clear = { verdict: 'clear' as const, marginPercent: 300 };
    expect(worstIndex([unreachable, clear])).toBe(1);
    // Equal items: the first is kept.
    expect(worstIndex([clear, { ...clear }])).toBe(0);
  });

  it('verdict words are plain words', () => {
    expect(VERDICT_WORDS).toEqual({ clear: 'clear', close: 'close', 'inside-band': 'inside band' });
  });
});
