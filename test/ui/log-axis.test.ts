import { describe, it, expect } from 'vitest';
import { logAxisFor, toPx, logTicks } from '../../src/ui/plots/log-axis';

describe('logarithmic frequency axis', () => {
  it('spans whole decades around the values, at least two of them', () => {
    expect(logAxisFor([0.35, 2.4], 0, 100)).toMatchObject({ minHz: 0.1, maxHz: 10 });
    expect(logAxisFor([12, 480], 0, 100)).toMatchObject({ minHz: 10, maxHz: 1000 });
    expect(logAxisFor([3, 4], 0, 100)).toMatchObject({ minHz: 0.1, maxHz: 10 }); // one decade widened downwards
  });
  it('ignores zero, negative and non-finite values', () => {
    expect(logAxisFor([0, -1, NaN, 5], 0, 100)).toMatchObject({ minHz: 0.1, maxHz: 10 });
  });
  it('places each decade an equal distance apart (the definition of a log scale)', () => {
    const axis = { minHz: 0.1, maxHz: 100, fromPx: 0, toPx: 300 };
    expect(toPx(axis, 0.1)).toBeCloseTo(0, 9);
    expect(toPx(axis, 1)).toBeCloseTo(100, 9);
    expect(toPx(axis, 10)).toBeCloseTo(200, 9);
    expect(toPx(axis, Math.sqrt(10))).toBeCloseTo(150, 9);
  });
  it('holds values outside the axis at its ends', () => {
    const axis = { minHz: 1, maxHz: 100, fromPx: 10, toPx: 210 };
    expect(toPx(axis, 0.001)).toBe(10);
    expect(toPx(axis, 1e6)).toBe(210);
  });
  it('ticks at 1, 2 and 5 times each power of ten', () => {
    const t = logTicks({ minHz: 1, maxHz: 100, fromPx: 0, toPx: 1 });
    expect(t.map((x) => x.hz)).toEqual([1, 2, 5, 10, 20, 50, 100]);
    expect(t.filter((x) => x.major).map((x) => x.hz)).toEqual([1, 10, 100]);
  });
});
