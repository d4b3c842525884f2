import { describe, expect, it } from 'vitest';
import { modeCells, modeRows } from '../../../src/ui/results/mode-rows';
import { addedMassLines, referenceAreas, zoneCells } from '../../../src/ui/results/zone-rows';
import { displayUnits } from '../../../src/ui/results/display-units';
import { levelRows, plotLandmarks, stretchRows } from '../../../src/ui/results/landmark-rows';
import type { MemberBuild } from '../../../src/kinds/common/types';
import { dryMember, wetMember, zone } from './fixtures';

describe('modes table rows', () => {
  it('lists dry and wet frequency, ratio, wet period and liquid energy share per mode', () => {
    const cells = modeRows(wetMember()).map(modeCells);
    expect(cells).toEqual([
      // 0.5/0.55 = 0.909; wet period 1/0.5 = 2 s; share 0.1 = 10 %
      { mode: '1', dry: '0.550 Hz', wet: '0.500 Hz', ratio: '0.909', period: '2.00 s', liquidShare: '10.0 %' },
      // 3.0/3.3 = 0.909; period 1/3 = 0.333 s; share 25 %
      { mode: '2', dry: '3.30 Hz', wet: '3.00 Hz', ratio: '0.909', period: '0.333 s', liquidShare: '25.0 %' },
    ]);
  });

  it('shows dashes for wet values and the dry period when the member has no liquid', () => {
    const [first] = modeRows(dryMember()).map(modeCells);
    // dry period 1/0.55 = 1.818 s
    expect(first).toEqual({ mode: '1', dry: '0.550 Hz', wet: '—', ratio: '—', period: '1.82 s', liquidShare: '—' });
  });
});

describe('mass per length by zone', () => {
  it('gives every mass column in lb/ft and the zone in ft for a US case', () => {
    const us = displayUnits('us');
    const c = zoneCells(zone({ fromM: 4.572, toM: 15.872 }), us, referenceAreas([zone({})]));
    // kg/m → lb/ft: × 0.3048 / 0.45359237 = × 0.671969; 200 → 134.4, 805 → 540.9
    expect(c).toMatchObject({ range: '15–52.07', submerged: 'yes', structure: '134', contents: '0', added: '541', ca: '1.00', addedToDisplaced: '1.00', addedToStructural: '4.03' });
  });

  it('marks Ca with its reference area only when zones use more than one', () => {
    const circle = zone({});
    const plate = zone({ caReferenceArea: 'π (w/2)², w = plate width including coating', addedMassCoefficientCa: 0.8 });
    const refs = referenceAreas([circle, plate, zone({ submerged: false, addedMassCoefficientCa: null, caReferenceArea: 'unused' })]);
    expect(refs).toEqual([circle.caReferenceArea, plate.caReferenceArea]);
    const si = displayUnits('si');
    expect(zoneCells(plate, si, refs).ca).toBe('0.800 [b]');
    expect(zoneCells(circle, si, [circle.caReferenceArea]).ca).toBe('1.00');
  });

  it('names the closed form used and the reduction factors with their sources', () => {
    const m = wetMember({
      addedMass: {
        endEffect: { factor: 0.62, basis: 'rectangular plate', submergedLengthM: 1.5, widthM: 0.25, source: 'DNV-RP-H103, Modelling and Analysis of Marine Operations, Table A-2' },
        perforation: { ratio: 0.2, factor: 0.85, source: 'DNV-RP-H103, Modelling and Analysis of Marine Operations, §4.6.4.3' },
        sectionSolves: 0,
        sectionRelativeError: null,
      },
    });
    const lines = addedMassLines(m, displayUnits('si'));
    expect(lines[0]).toEqual({ text: 'Circle in open liquid, closed form m_a = ρ π D²/4 (Ca = 1)', source: 'H. Lamb, Hydrodynamics (classical)' });
    expect(lines[1]).toEqual({ text: 'Perforation ratio 20.0 %: added mass × 0.850', source: 'DNV-RP-H103, Modelling and Analysis of Marine Operations, §4.6.4.3' });
    expect(lines[2]).toEqual({
      text: '3D end effect (rectangular plate, submerged length 1.5 m, width 250 mm): added mass × 0.620',
      source: 'DNV-RP-H103, Modelling and Analysis of Marine Operations, Table A-2',
    });
  });

  it('states the section solver resolution and how many distinct sections were solved', () => {
    const m = wetMember({ zones: [zone({ addedMassMethod: 'section solver' })], addedMass: { endEffect: null, perforation: null, sectionSolves: 2, sectionRelativeError: null } });
    const [line] = addedMassLines(m, displayUnits('si'));
    expect(line.text).toContain('from 64 panels per body, Richardson-extrapolated from coarser companion solves');
    expect(line.text).toContain('2 distinct section solves');
  });
});

describe('levels beside the schematic', () => {
  const build = {
    model: { lengthM: 20 },
    landmarks: [
      { id: 'fixity', label: 'Effective fixity', zM: 0 },
      { id: 'still-water', label: 'Still water level', zM: 15 },
      { id: 'top', label: 'Pile top', zM: 20 },
      { id: 'mass', label: 'Top mass', zM: 20 },
      { id: 'water-surface', label: 'Water surface with offset', zM: 21.8 },
    ],
    bands: [{ id: 'submerged', label: 'In water', fromM: 0, toM: 15 }],
    origin: 'effective fixity point below the mudline',
    notes: [],
    kind: 'pile',
  } as unknown as MemberBuild;

  it('lists every level in the user’s units and flags those outside the member', () => {
    const rows = levelRows(build, displayUnits('us'));
    // 15 m / 0.3048 = 49.21 ft; 21.8 m = 71.52 ft
    expect(rows[1]).toEqual({ label: 'Still water level', z: '49.21 ft', outside: false });
    expect(rows[4]).toEqual({ label: 'Water surface with offset', z: '71.52 ft', outside: true });
    expect(stretchRows(build, displayUnits('si'))).toEqual([{ label: 'In water', range: '0–15 m' }]);
  });

  it('merges levels at the same height into one plot label and leaves out levels beyond the member', () => {
    expect(plotLandmarks(build.landmarks, 20)).toEqual([
      { label: 'Effective fixity', zM: 0 },
      { label: 'Still water level', zM: 15 },
      { label: 'Pile top, Top mass', zM: 20 },
    ]);
  });
});
