import { describe, expect, it } from 'vitest';
import { chooseSegmentLength, welchPsd } from '../../../src/physics/signal';
import { expectClose } from '../../helpers/expect-close';
import { seededGaussian } from './synthetic';

describe("Welch's averaged periodogram", () => {
  it('gives white noise of unit variance a spectrum whose area is that variance', () => {
    const g = seededGaussian(21);
    const x = Float64Array.from({ length: 200_000 }, () => g());
    const s = welchPsd(x, 200, 1024);
    let area = 0;
    for (const v of s.psd) area += v * s.resolutionHz;
    // Parseval's theorem (classical): the one-sided density integrates to the variance. 389 segments of 1024
    // samples leave a scatter of the total of well under 1 %; 3 % allows for that and the segment means removed.
    expectClose(area, 1, { rtol: 0.03, label: 'area under the white-noise spectrum' });
    // The density of unit white noise sampled at 200 Hz is 2/200 = 0.01 per Hz one-sided (classical).
    const mid = s.psd.slice(50, 450).reduce((a, b) => a + b, 0) / 400;
    expectClose(mid, 0.01, { rtol: 0.03, label: 'white-noise density' });
    expect(s.segments).toBe(389);
  });

  it('puts the power A²/2 of a sine under its peak, at its frequency', () => {
    const f0 = 13.37;
    const x = Float64Array.from({ length: 40_000 }, (_, i) => 2 * Math.sin((2 * Math.PI * f0 * i) / 200 + 0.3));
    const s = welchPsd(x, 200, 2048);
    const k = Math.round(f0 / s.resolutionHz);
    let power = 0;
    for (let j = k - 6; j <= k + 6; j++) power += s.psd[j] * s.resolutionHz;
    // The mean square of A sin is A²/2 = 2 (classical); ±6 bins hold all but a few 1e-4 of a Hann peak's power
    // (its sidelobes fall 31 dB and more below the top: Harris 1978, Table 1).
    expectClose(power, 2, { rtol: 0.005, label: 'power under the sine peak' });
    let top = 0;
    for (let j = 1; j < s.psd.length; j++) if (s.psd[j] > s.psd[top]) top = j;
    expect(Math.abs(top * s.resolutionHz - f0)).toBeLessThanOrEqual(s.resolutionHz / 2);
  });

  it('chooses at least seven segments by default and says when a record is too short for the resolution asked', () => {
    expect(chooseSegmentLength(12_001, 200)).toEqual({ length: 2048, note: null });
    expect(chooseSegmentLength(12_001, 200, 0.1)).toEqual({ length: 2048, note: null });
    const short = chooseSegmentLength(12_001, 200, 0.01);
    expect(short.length).toBe(4096);
    expect(short.note).toBe('the record is too short for a resolution of 0.01 Hz: got 0.0488 Hz; a record of at least 328 s would give it');
  });
});
