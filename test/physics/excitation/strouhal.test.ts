import { describe, expect, it } from 'vitest';
import {
  RE_SUBCRITICAL_MAX,
  RE_SUBCRITICAL_MIN,
  RE_TRANSCRITICAL_MIN,
  strouhalCircle,
  strouhalNumber,
  strouhalRegimes,
} from '../../../src/physics/excitation/strouhal';

describe('Strouhal number by section and Reynolds number', () => {
  it('is 0.2 for a circle in the subcritical range 300 … 2×10⁵, both ends included', () => {
    // Published: St ≈ 0.2 for subcritical Re (common practice; DNV-RP-C205 §9), docs/sources.md §S6.2.
    for (const re of [300, 1e3, 5e4, 2e5]) {
      const st = strouhalCircle(re);
      expect(st.value, `Re = ${re}`).toBe(0.2);
      expect(st.regime).toBe('subcritical');
      expect(st.source).toContain('DNV-RP-C205');
    }
    expect(RE_SUBCRITICAL_MIN).toBe(300);
    expect(RE_SUBCRITICAL_MAX).toBe(2e5);
  });

  it('is 0.27 for a circle in the transcritical range above 3.5×10⁶', () => {
    // Published: St = 0.27 for Re > 3.5×10⁶, A. Roshko, J. Fluid Mech. 10 (1961) 345; docs/sources.md §S6.2.
    expect(RE_TRANSCRITICAL_MIN).toBe(3.5e6);
    for (const re of [3.5e6 * (1 + 1e-9), 1e7, 1e9]) {
      const st = strouhalCircle(re);
      expect(st.value).toBe(0.27);
      expect(st.regime).toBe('transcritical');
      expect(st.source).toContain('Roshko');
    }
  });

  it('uses the band 0.2–0.27 in the critical range and screens with its upper end', () => {
    // Wetmode choice, documented in strouhal.ts: between the two published anchors (0.2 DNV-RP-C205 §9;
    // 0.27 Roshko 1961), upper end used because a higher St is conservative for f_s/f_n.
    for (const re of [2e5 * (1 + 1e-9), 1e6, 3.5e6]) {
      const st = strouhalCircle(re);
      expect([st.low, st.value, st.high]).toEqual([0.2, 0.27, 0.27]);
      expect(st.regime).toBe('critical');
      expect(st.source).toMatch(/override/);
    }
  });

  it('below Re = 300 keeps 0.2 as a conservative upper value and says so', () => {
    // From memory: laminar shedding St rises from ≈0.12 to 0.2 (Roshko, NACA Report 1191, 1954).
    const st = strouhalCircle(100);
    expect(st.regime).toBe('laminar');
    expect(st.value).toBe(0.2);
    expect(st.low).toBeLessThan(st.high);
    expect(st.source).toContain('conservative');
  });

  it('the value used is never below the band and never falls as Re rises (property)', () => {
    let prev = 0;
    for (let e = 0; e <= 10; e += 0.05) {
      const st = strouhalCircle(10 ** e);
      expect(st.value).toBe(st.high);
      expect(st.low).toBeLessThanOrEqual(st.high);
      expect(st.value).toBeGreaterThanOrEqual(prev);
      prev = st.value;
    }
  });

  it('gives tabulated values for a thin plate normal to the flow and a square, each with a named source', () => {
    // From memory: flat plate normal to flow St ≈ 0.14–0.15 (Fage & Johansen 1927; Blevins, Flow-Induced Vibration);
    // square face-on St ≈ 0.13 (Okajima 1982), 0.12 in EN 1991-1-4 Table E.1.
    const plate = strouhalNumber({ kind: 'rectangle', widthAcrossFlowM: 1, depthAlongFlowM: 0.01 }, 1e5);
    expect(plate.regime).toBe('plate-normal');
    expect(plate.value).toBe(0.15);
    expect(plate.source).toMatch(/Fage/);
    const square = strouhalNumber({ kind: 'rectangle', widthAcrossFlowM: 0.3, depthAlongFlowM: 0.3 }, 1e5);
    expect(square.regime).toBe('square');
    expect([square.low, square.value]).toEqual([0.12, 0.13]);
    expect(square.source).toMatch(/Okajima/);
  });

  it('labels the value for other rectangles as a Wetmode default without a source', () => {
    const st = strouhalNumber({ kind: 'rectangle', widthAcrossFlowM: 0.1, depthAlongFlowM: 0.3 }, 1e5);
    expect(st.regime).toBe('rectangle-default');
    expect(st.source).toMatch(/Wetmode default, no source/);
  });

  it('a circle section delegates to the Reynolds-number table, and its regimes tile Re from 0 to infinity', () => {
    expect(strouhalNumber({ kind: 'circle', outerDiameterM: 1 }, 1e6)).toEqual(strouhalCircle(1e6));
    const regimes = strouhalRegimes({ kind: 'circle', outerDiameterM: 1 });
    expect(regimes[0].reFrom).toBe(0);
    expect(regimes[regimes.length - 1].reTo).toBe(Infinity);
    for (let i = 1; i < regimes.length; i++) expect(regimes[i].reFrom).toBe(regimes[i - 1].reTo);
    // Each regime's St is what strouhalCircle returns inside it.
    for (const r of regimes) {
      const mid = r.reTo === Infinity ? r.reFrom * 10 : (r.reFrom + r.reTo) / 2;
      expect(strouhalCircle(mid)).toEqual(r.st);
    }
  });
});
