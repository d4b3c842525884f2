import { describe, it, expect } from 'vitest';
import { chartBands } from '../../src/ui/results/chart-bands';
import { screenResonance } from '../../src/physics/excitation';
import { pileCase, linearMode } from '../physics/excitation/fixtures';
import { expectClose } from '../helpers/expect-close';

describe('excitation bands for the frequency chart', () => {
  it('a pump order appears as a line at order × rpm / 60 and a wave band as 1/Tmax to 1/Tmin', () => {
    const result = screenResonance(
      pileCase(0.8, 1.0, {
        waves: { periodMinS: 4, periodMaxS: 12 },
        machinery: [{ label: 'pump', shaftSpeedHz: 20, shaftOrders: [1] }],
      }),
    );
    const bands = chartBands(result);
    const pump = bands.find((b) => b.kind === 'machinery')!;
    // 1 × 1200 rpm / 60 = 20 Hz (classical: shaft frequency)
    expectClose(pump.lowHz, 20, { rtol: 1e-12, label: 'pump 1× line, low' });
    expectClose(pump.highHz, 20, { rtol: 1e-12, label: 'pump 1× line, high' });
    const waves = bands.find((b) => b.kind === 'waves')!;
    // 1/12 s to 1/4 s (definition of frequency)
    expectClose(waves.lowHz, 1 / 12, { rtol: 1e-12, label: 'wave band low edge' });
    expectClose(waves.highHz, 1 / 4, { rtol: 1e-12, label: 'wave band high edge' });
  });

  it('a cross-flow lock-in band spans U/(16 D) to U/(3 D) (DNV-RP-C205 §9 range 3 ≤ V_R ≤ 16)', () => {
    const result = screenResonance(pileCase(0.5, 1.5));
    const cf = chartBands(result).find((b) => b.kind === 'cross-flow-viv')!;
    // Uniform U = 1.5 m/s and D = 1 m in the fixture, so the band does not depend on where the mode is evaluated.
    expectClose(cf.lowHz, 1.5 / 16, { rtol: 1e-9, label: 'cross-flow band low edge' });
    expectClose(cf.highHz, 1.5 / 3, { rtol: 1e-9, label: 'cross-flow band high edge' });
  });

  it('merges one excitation over several modes into one band, sorted by frequency', () => {
    const input = pileCase(0.5, 1.5, { machinery: [{ label: 'fan', shaftSpeedHz: 10, shaftOrders: [1] }] });
    input.modes = [linearMode(0.5), linearMode(3.2)];
    const bands = chartBands(screenResonance(input));
    const labels = bands.map((b) => b.label);
    expect(new Set(labels).size).toBe(labels.length);
    for (let i = 1; i < bands.length; i++) expect(bands[i].lowHz).toBeGreaterThanOrEqual(bands[i - 1].lowHz);
  });
});
