import { describe, expect, it } from 'vitest';
import { resampleUniform, sampleTiming } from '../../../src/physics/signal';
import { unfoldVoigt } from '../../../src/physics/signal/half-power';
import { expectClose } from '../../helpers/expect-close';

describe('putting irregular samples on an even grid', () => {
  it('measures the median interval, the achieved rate, the scatter of intervals and the longest gap', () => {
    // Intervals alternate 0.9 and 1.1 of 10 ms, with one gap of 50 ms: values worked by hand.
    const t: number[] = [0];
    for (let i = 1; i <= 200; i++) t.push(t[i - 1] + (i === 120 ? 0.05 : i % 2 ? 0.009 : 0.011));
    const timing = sampleTiming(Float64Array.from(t));
    // 100 intervals of 9 ms, 99 of 11 ms and one of 50 ms: the median of 200 is the mean of the 100th and 101st, 10 ms.
    expect(timing.medianIntervalS).toBeCloseTo(0.01, 12);
    expectClose(timing.meanRateHz, 200 / t[200], { rtol: 1e-12, label: 'achieved rate = intervals / duration' });
    expectClose(timing.longestGapS, 0.05, { rtol: 1e-12, label: 'longest gap' });
    expectClose(timing.longestGapAtS, t[119], { rtol: 1e-12, label: 'where the gap begins' });
    expect(timing.intervalJitter).toBeGreaterThan(0.1);
  });

  it('reproduces a straight line exactly and a slow sine closely, at any jitter', () => {
    const t = Float64Array.from({ length: 500 }, (_, i) => i / 60 + (i % 3 === 1 ? 0.004 : 0));
    const line = Float64Array.from(t, (x) => 3 - 2 * x);
    const sine = Float64Array.from(t, (x) => Math.sin(2 * Math.PI * 0.5 * x));
    const g = resampleUniform(t, [line, sine]);
    const step = 1 / g.rateHz;
    let worst = 0;
    for (let k = 0; k < g.n; k++) {
      expect(g.axes[0][k]).toBeCloseTo(3 - 2 * k * step, 10); // interpolation of a line is exact (classical)
      worst = Math.max(worst, Math.abs(g.axes[1][k] - Math.sin(2 * Math.PI * 0.5 * k * step)));
    }
    // Linear interpolation errs by at most h²/8 · max|x''| (classical error bound): h ≈ 0.021 s, |x''| ≤ (π)², about 5e-4.
    expect(worst).toBeLessThan(6e-4);
  });

  it('unfolds the window from a half-power width: no window gives the width back, a wider window takes more off', () => {
    // Olivero & Longbothum's Voigt width with no Gaussian part is the Lorentzian width itself; their coefficients
    // are rounded to four figures (0.5346 + √0.2166 = 0.99999...), hence 1e-5.
    expectClose(unfoldVoigt(5, 0), 5, { rtol: 1e-5, label: 'no window' });
    // Cross-check: forward formula f_V = 0.5346 f_L + √(0.2166 f_L² + f_G²) on the unfolded width gives f_V back.
    for (const [fV, fG] of [[3, 1.44], [8, 1.44], [20, 1.44]]) {
      const fL = unfoldVoigt(fV, fG);
      expectClose(0.5346 * fL + Math.sqrt(0.2166 * fL * fL + fG * fG), fV, { rtol: 1e-12, label: `round trip at ${fV} bins` });
      expect(fL).toBeLessThan(fV);
    }
  });
});
