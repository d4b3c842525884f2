import { describe, expect, it } from 'vitest';
import { chartBands } from '../../../src/ui/results/chart-bands';
import { bandRows, bandText, chartModes, checkRows, limitRows, SourceList, sheddingRows } from '../../../src/ui/results/check-rows';
import { displayUnits } from '../../../src/ui/results/display-units';
import { modeRows } from '../../../src/ui/results/mode-rows';
import { screenResonance } from '../../../src/physics/excitation';
import { linearMode, pileCase } from '../../physics/excitation/fixtures';
import { dryMember, pileScreening, wetMember } from './fixtures';

const si = displayUnits('si');

// Standard pile, f = 0.5 Hz, U = 1.5 m/s, D = 1 m; waves 4–12 s; a pump at 1200 rpm, 1× only.
const withWavesAndPump = () =>
  pileScreening({ waves: { periodMinS: 4, periodMaxS: 12 }, machinery: [{ label: 'pump', shaftSpeedHz: 20, shaftOrders: [1] }] });

describe('resonance checks as a table', () => {
  it('gives each check its compared frequency, band, signed margin and critical speed', () => {
    const rows = checkRows(withWavesAndPump(), si, new SourceList());
    expect(rows.map((r) => [r.label, r.compared, r.verdict, r.band, r.margin, r.critical])).toEqual([
      // in-line: U/(4.5 D) … U/(1.0 D) = 0.333–1.5 Hz, 50 % inside; onset 1.0 × 0.5 × 1 = 0.5 m/s (DNV-RP-C205 §9)
      ['in-line VIV', 'wet 0.500 Hz', 'inside-band', '0.333–1.50 Hz', '\u221250.0 %', '0.5 m/s'],
      // cross-flow: U/(16 D) … U/(3 D) = 0.0938–0.5 Hz, f on the upper edge; onset 3.0 × 0.5 × 1 = 1.5 m/s
      ['cross-flow VIV', 'wet 0.500 Hz', 'inside-band', '0.0938–0.500 Hz', '0 %', '1.5 m/s'],
      // pump 1× = 1200/60 = 20 Hz; margin (1 − 0.5/20) = 97.5 %; shaft speed that hits 0.5 Hz: 30 rpm (classical)
      ['pump 1× shaft', 'wet 0.500 Hz', 'clear', '20.0 Hz', '+97.5 %', '30 rpm shaft'],
      // waves 1/12 … 1/4 Hz; f above by 0.5/0.25 − 1 = 100 %
      ['waves 4–12 s', 'wet 0.500 Hz', 'clear', '0.0833–0.250 Hz', '+100 %', '—'],
    ]);
  });

  it('numbers each distinct source once, in order of first use', () => {
    const input = pileCase(0.5, 1.5);
    input.modes = [linearMode(0.5), linearMode(2.0)];
    const sources = new SourceList();
    const rows = checkRows(screenResonance(input), si, sources);
    expect(rows.map((r) => r.source)).toEqual([1, 2, 1, 2]);
    expect(sources.items).toHaveLength(2);
    expect(sources.items[1]).toContain('DNV-RP-C205 §9');
  });

  it('converts critical speeds to ft/s for a US case', () => {
    // 0.5 m/s / 0.3048 = 1.640 ft/s
    expect(checkRows(pileScreening(), displayUnits('us'), new SourceList())[0].critical).toBe('1.64 ft/s');
  });

  it('writes a one-sided stem band and a missing band in words', () => {
    expect(bandText({ lowHz: 0, highHz: 36.4 })).toBe('below 36.4 Hz');
    expect(bandText(null)).toBe('—');
  });
});

describe('the chart and its tables agree', () => {
  it('every check band lies inside the band drawn for its excitation, and each drawn edge comes from a check', () => {
    // Property: chartBands is the union per label, so it encloses every check and each edge is attained.
    const input = pileCase(0.5, [
      { zM: 0, speedMPerS: 0.4 },
      { zM: 15, speedMPerS: 1.5 },
    ], { waves: { periodMinS: 4, periodMaxS: 12 } });
    input.modes = [linearMode(0.5), linearMode(1.7), linearMode(4.1)];
    const s = screenResonance(input);
    const bands = chartBands(s);
    const checks = s.modes.flatMap((m) => m.checks).filter((c) => c.bandHz);
    for (const b of bands) {
      const mine = checks.filter((c) => c.label === b.label);
      expect(mine.length).toBeGreaterThan(0);
      for (const c of mine) {
        expect(c.bandHz!.lowHz).toBeGreaterThanOrEqual(b.lowHz);
        expect(c.bandHz!.highHz).toBeLessThanOrEqual(b.highHz);
      }
      expect(Math.min(...mine.map((c) => c.bandHz!.lowHz))).toBe(b.lowHz);
      expect(Math.max(...mine.map((c) => c.bandHz!.highHz))).toBe(b.highHz);
    }
    expect(bandRows(bands).map((r) => r.label)).toEqual(bands.map((b) => b.label));
  });

  it('draws the same mode frequencies as the modes table', () => {
    const member = wetMember();
    const drawn = chartModes(member);
    const table = modeRows(member);
    expect(drawn.map((m) => [m.index, m.dryHz, m.wetHz])).toEqual(table.map((r) => [r.mode, r.dryHz, r.wetHz]));
  });

  it('draws a member without liquid with its dry frequencies only', () => {
    expect(chartModes(dryMember())).toEqual([
      { index: 1, wetHz: 0.55 },
      { index: 2, wetHz: 3.3 },
    ]);
  });
});

describe('shedding and limits', () => {
  it('reports U, D, Re, St, f_s, V_R and K_S where the mode moves most under water', () => {
    const sources = new SourceList();
    const [row] = sheddingRows(pileScreening(), si, sources);
    expect(row.cells).toEqual({
      at: '15',
      speed: '1.5 m/s',
      size: '1000 mm',
      // Re = U D / ν = 1.5 × 1 / 1.19e-6 = 1.26e6 (seawater default ν)
      reynolds: '1260000',
      // 2×10⁵ < Re ≤ 3.5×10⁶: band 0.2–0.27, 0.27 used (strouhal.ts, Roshko 1961 as cited there)
      strouhal: '0.270 (0.200–0.270), critical',
      // f_s = 0.27 × 1.5 / 1 = 0.405 Hz; V_R = 1.5 / (0.5 × 1) = 3
      sheddingHz: '0.405 Hz',
      reducedVelocity: '3.00',
      // K_S = 4π m_e ζ / (ρ D²) = 4π × 2000 × 0.005 / 1025 = 0.1226 (DNV-RP-C205 §9)
      stability: '0.123',
      effectiveMass: '2000 kg/m',
    });
    expect(sources.items[row.source! - 1]).toContain('Roshko');
  });

  it('says why a mode has no shedding numbers when it is not under the liquid', () => {
    const input = pileCase(0.5, 1.5);
    input.zones = [];
    const [row] = sheddingRows(screenResonance(input), si, new SourceList());
    expect(row.cells).toBeNull();
    expect(row.why).toBeTruthy();
  });

  it('lists the limits as their sources state them, with damping and liquid', () => {
    const rows = limitRows(pileScreening(), si);
    expect(rows.map((r) => [r.name, r.value])).toEqual([
      ['In-line VIV range', '1 ≤ V_R ≤ 4.5'],
      ['In-line VIV only when', 'K_S ≤ 1.8'],
      ['Cross-flow VIV range', '3 ≤ V_R ≤ 16'],
      ['Frequency separation', '±20 %'],
      ['Damping ratio ζ', '0.5 % of critical'],
      ['Liquid', 'ρ = 1025 kg/m³, ν = 1.19e-6 m²/s'],
    ]);
    for (const r of rows) expect(r.source.length).toBeGreaterThan(0);
  });
});
