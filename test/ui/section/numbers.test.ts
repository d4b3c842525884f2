import { describe, expect, it } from 'vitest';
import type { SectionResult } from '../../../src/physics/section';
import { bodyRows, describeBody, dofLabel, energyRows, entryUnit, errorText, matrixCells, referenceAreaText, sectionUnits } from '../../../src/ui/section/numbers';

// Values and units are joined by no-break spaces; compared here as plain spaces.
const sp = (t: string) => t.replace(/\u00a0/g, ' ');
const si = sectionUnits('si');
const us = sectionUnits('us');
const RHO = 1025;
const R = 0.25;
const m = RHO * Math.PI * R * R; // 201.26 kg/m: ρπR², a circle's added mass (classical, Lamb)

/** A made-up result of one circle (values chosen for the formatting, not solved). */
function circleResult(): SectionResult {
  return {
    addedMass: [
      [m, 0, 0],
      [0, m, 0],
      [0, 0, 0],
    ],
    asymmetry: 0,
    bodies: [
      {
        index: 0,
        referencePointM: [0, 0],
        wettedAreaM2: Math.PI * R * R,
        displacedMassKgPerM: m,
        addedMassX: m,
        addedMassY: m,
        addedInertiaRotation: 0,
        caX: 1,
        caY: 0.99991,
        referenceHalfWidthXM: R,
        referenceHalfWidthYM: R,
        addedToDisplacedX: 1,
        addedToDisplacedY: 0.99991,
        blockedDofs: [],
        panels: 128,
      },
    ],
    errorEstimates: [
      { dof: 0, body: 0, motion: 'x', fine: m, coarse: m, extrapolated: m, order: 2, absoluteError: 2.4e-5 * m, relativeError: 2.4e-5 },
    ],
    energyChecks: [{ dof: 0, body: 0, motion: 'x', boundaryIntegral: m, fieldIntegral: 0.998 * m, tail: 1, relativeDifference: -0.002 }],
    panelsFine: 128,
    panelsCoarse: 64,
    notes: [],
  };
}

describe('the section numbers as text', () => {
  it('labels matrix rows and columns body by body as x, y, θ', () => {
    expect([0, 1, 2, 3, 4, 5].map(dofLabel)).toEqual(['body 1 x', 'body 1 y', 'body 1 θ', 'body 2 x', 'body 2 y', 'body 2 θ']);
  });

  it('gives each matrix entry its own unit: per length, coupling, rotary inertia', () => {
    expect([entryUnit(0, 1, si), entryUnit(0, 2, si), entryUnit(5, 2, si), entryUnit(2, 3, us)]).toEqual(['kg/m', 'kg m/m', 'kg m^2/m', 'lb ft/ft']);
  });

  it('shows added mass, Ca, reference area, ratio and error per motion', () => {
    const rows = bodyRows(circleResult(), 0, si);
    expect(rows.map((r) => [r.label, r.x, r.y, r.rotation].map(sp))).toEqual([
      ['Added mass per metre', '201.3 kg/m', '201.3 kg/m', '0 kg·m²/m'],
      ['Ca', '1.000', '0.9999', '—'],
      ['Reference area π a²', '0.1963 m² (a = 250 mm)', '0.1963 m² (a = 250 mm)', '—'],
      ['Added / displaced liquid mass', '1.000', '0.9999', '—'],
      ['Error estimate', '±0.0024 %', '—', '—'],
    ]);
  });

  it('converts to lb/ft and inches for US units', () => {
    const rows = bodyRows(circleResult(), 0, us);
    // 201.26 kg/m × 0.3048 / 0.45359237 = 135.24 lb/ft; 250 mm / 25.4 = 9.843 in; 0.19635 m² / 0.3048² = 2.113 ft² (exact definitions).
    expect(sp(rows[0].x)).toBe('135.2 lb/ft');
    expect(sp(rows[2].x)).toBe('2.113 ft² (a = 9.843 in)');
  });

  it('marks a blocked motion instead of showing a zero', () => {
    const r = circleResult();
    r.bodies[0].blockedDofs = ['y'];
    const rows = bodyRows(r, 0, si);
    expect(rows[0].y).toBe('blocked');
    expect(rows[1].y).toBe('blocked');
  });

  it('shows both energy values and their difference', () => {
    expect(energyRows(circleResult().energyChecks, si)).toEqual([
      { label: 'body 1 sway (x)', unit: 'kg/m', boundary: '201.3', field: '200.9', difference: '\u22120.20 %', flag: null },
    ]);
  });

  it('flags a cross-check that disagrees by more than 5 % as a grid too coarse for the flow', () => {
    const checks = circleResult().energyChecks.map((c) => ({ ...c, fieldIntegral: c.boundaryIntegral * 0.8, relativeDifference: -0.2 }));
    const [row] = energyRows(checks, si);
    expect(row.difference).toBe('\u221220 %');
    expect(row.flag).toMatch(/field grid is too coarse/);
  });

  it('shows round-off entries as 0 and gives them no error estimate', () => {
    const r = circleResult();
    // A circle turning about its centre moves no liquid: its added inertia is round-off (classical, Lamb).
    r.addedMass[2][2] = 5.1e-31;
    r.addedMass[0][1] = r.addedMass[1][0] = 2.1e-15;
    r.addedMass[0][2] = r.addedMass[2][0] = 0.02;
    const e = { dof: 2, body: 0, motion: 'rotation' as const, fine: 5.1e-31, coarse: 1e-31, extrapolated: 0, order: 1, absoluteError: 5.1e-31, relativeError: 1 };
    r.errorEstimates.push(e);
    expect(matrixCells(r, si)).toEqual([
      ['201.3', '0', '0.02000'],
      ['0', '201.3', '0'],
      ['0.02000', '0', '0'],
    ]);
    expect(errorText(e, r)).toBe('—');
    expect(sp(bodyRows(r, 0, si)[0].rotation)).toBe('0 kg·m²/m');
    expect(errorText({ ...e, dof: 0, relativeError: 3e-7 }, r)).toBe('< 0.001 %');
  });

  it('formats every matrix entry in its unit', () => {
    const cells = matrixCells(circleResult(), us);
    expect(cells).toHaveLength(3);
    expect(cells[0]).toEqual(['135.2', '0', '0']);
  });

  it('describes a body in a few words for captions', () => {
    const mm = (x: number) => `${Math.round(x * 1000)} mm`;
    expect(describeBody({ shape: 'rectangle', widthM: 0.4, heightM: 0.2, cornerRadiusM: 0.01, angleDeg: 30 }, mm)).toBe(
      'rectangle 400 mm × 200 mm, corner radius 10 mm at 30°',
    );
    expect(describeBody({ shape: 'circle', diameterM: 0.5 }, mm)).toBe('circle 500 mm');
    expect(errorText(undefined)).toBe('—');
    expect(sp(referenceAreaText(0.5, si))).toBe('0.7854 m² (a = 500 mm)');
    // A 25 mm stem: π × 12.5² = 490.9 mm²; in US units π × (12.5/25.4)² = 0.7609 in².
    expect(sp(referenceAreaText(0.0125, si))).toBe('490.9 mm² (a = 12.5 mm)');
    expect(sp(referenceAreaText(0.0125, us))).toBe('0.7609 in² (a = 0.4921 in)');
  });
});
