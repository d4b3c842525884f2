/**
 * Time to a frequency band (corner method with its monotonicity checks, sampled search where needed) for
 * each example member with six ranged inputs each, likely answer included. Target: ≤ 300 ms for up to six
 * ranged inputs (in a worker, on a field tablet). Ranges are invented but of the size a surveyor would enter.
 */
import { parseMemberModel, type MemberModel } from '../../src/physics/beam';
import { memberBand } from '../../src/physics/uncertain/band';
import type { InputRange } from '../../src/physics/uncertain/ranges';
import pile from '../../examples/member-fender-pile-port-halloran.json';
import riser from '../../examples/member-riser-skerry-alpha.json';
import baffle from '../../examples/member-baffle-marrow-creek.json';
import stem from '../../examples/member-temperature-stem-tern-haven.json';
import { PILE_RANGES } from '../physics/uncertain/fixtures';
import { report, time } from './timing';

const CASES: [string, unknown, InputRange[]][] = [
  ['fender pile', pile, PILE_RANGES],
  ['riser in caisson', riser, [
    { path: 'tensionN', low: 40000, high: 80000 },
    { path: 'liquid.toM', low: 24, high: 28 },
    { path: 'segments.0.contentsDensityKgPerM3', low: 800, high: 1100 },
    { path: 'liquid.densityKgPerM3', low: 1000, high: 1030 },
    { path: 'segments.0.section.wallThicknessM', low: 0.011, high: 0.0127 },
    { path: 'liquid.boundaries.0.diameterM', low: 0.55, high: 0.62 },
  ]],
  ['baffle by tank wall', baffle, [
    { path: 'liquid.toM', low: 1.5, high: 2.2 },
    { path: 'liquid.densityKgPerM3', low: 1000, high: 1200 },
    { path: 'liquid.perforationRatio', low: 0.05, high: 0.2 },
    { path: 'segments.0.section.thicknessM', low: 0.008, high: 0.012 },
    { path: 'segments.0.youngsModulusPa', low: 1.9e11, high: 2e11 },
    { path: 'liquid.boundaries.0.pointM.1', low: 0.17, high: 0.3 },
  ]],
  ['temperature stem', stem, [
    { path: 'masses.0.massKg', low: 0, high: 0.01 },
    { path: 'liquid.fromM', low: 0.04, high: 0.08 },
    { path: 'liquid.densityKgPerM3', low: 800, high: 1000 },
    { path: 'segments.0.endSection.outerDiameterM', low: 0.018, high: 0.02 },
    { path: 'segments.0.youngsModulusPa', low: 1.8e11, high: 2e11 },
    { path: 'segments.0.endSection.wallThicknessM', low: 0.0055, high: 0.0065 },
  ]],
];

export function run(): void {
  for (const [label, raw, ranges] of CASES) {
    const model: MemberModel = parseMemberModel(raw);
    for (const k of [2, 4, 6]) {
      const once = memberBand(model, ranges.slice(0, k));
      if (!once.ok) throw new Error(`${label}: ${once.message}`);
      report(`band, ${label}, ${k} ranged inputs`, time(() => memberBand(model, ranges.slice(0, k)), 3, 1), 300);
      console.log(`  ${once.band.solves} member solves (budget ${once.band.maxSolves}); method: ${once.band.methodText}`);
    }
  }
}
