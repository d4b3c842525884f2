/**
 * Mass per metre by zone, in the case's units, and the added-mass method and reduction factors used,
 * each with its source. Values come straight from the member result's zones.
 */
import type { AddedMassMethod } from '../../physics/beam/added-mass';
import type { MemberResult, ZoneResult } from '../../physics/beam/result';
import { SECTION_PANELS } from '../../physics/beam/section-bridge';
import { formatPercent } from '../format/numbers';
import { type DisplayUnits, num, plain, qty, rangeText, Z_DIGITS } from './display-units';

export interface ZoneCells {
  range: string;
  submerged: string;
  structure: string;
  contents: string;
  coating: string;
  added: string;
  /** Ca, with a reference-area mark ("1.00 [a]") when the zones use more than one reference area. */
  ca: string;
  addedToDisplaced: string;
  addedToStructural: string;
  /** True when the zone lies on a taper: values are averages over the zone. */
  tapered: boolean;
}

/** Distinct reference areas of Ca over the submerged zones, in order of first use. */
export function referenceAreas(zones: readonly ZoneResult[]): string[] {
  const out: string[] = [];
  for (const z of zones) if (z.submerged && z.addedMassCoefficientCa !== null && !out.includes(z.caReferenceArea)) out.push(z.caReferenceArea);
  return out;
}

/** Mark of the i-th reference area: [a], [b], … */
export function refMark(i: number): string {
  return `[${String.fromCharCode(97 + i)}]`;
}

/** Cells of one zone: plain numbers, the table headers carry the units (length, mass per length). */
export function zoneCells(z: ZoneResult, units: DisplayUnits, refs: readonly string[]): ZoneCells {
  const mpl = (v: number): string => plain(v, units.massPerLength);
  const refIndex = refs.indexOf(z.caReferenceArea);
  const mark = refs.length > 1 && refIndex >= 0 ? ` ${refMark(refIndex)}` : '';
  return {
    range: rangeText(z.fromM, z.toM, units.length, Z_DIGITS, false),
    submerged: z.submerged ? 'yes' : 'no',
    structure: mpl(z.structureKgPerM),
    contents: mpl(z.contentsKgPerM),
    coating: mpl(z.coatingKgPerM),
    added: mpl(z.addedKgPerM),
    ca: z.addedMassCoefficientCa === null ? '—' : `${num(z.addedMassCoefficientCa)}${mark}`,
    addedToDisplaced: num(z.addedToDisplacedLiquidMass),
    addedToStructural: num(z.addedToStructuralMass),
    tapered: z.tapered,
  };
}

/** A line of method text with the published source it rests on. */
export interface SourcedLine {
  text: string;
  source: string;
}

function methodLine(method: AddedMassMethod, sectionSolves: number, relativeError: number | null): SourcedLine {
  switch (method) {
    case 'circle closed form (Lamb)':
      return { text: 'Circle in open liquid, closed form m_a = ρ π D²/4 (Ca = 1)', source: 'H. Lamb, Hydrodynamics (classical)' };
    case 'flat plate closed form (Lamb)':
      return { text: 'Flat plate in open liquid, closed form m_a = ρ π (w/2)² (Ca = 1)', source: 'H. Lamb, Hydrodynamics (classical)' };
    case 'annulus closed form (Fritz)':
      return {
        text: 'Round member centred in a round pipe or caisson, closed form m_a = ρ π R1² (R2² + R1²) / (R2² − R1²)',
        source: 'R.J. Fritz, The effect of liquids on the dynamic motions of immersed solids, ASME J. Eng. Industry 94 (1972) 167',
      };
    case 'section solver':
      return {
        text:
          `Confined section: 2D potential-flow section solver (boundary elements), from ${SECTION_PANELS} panels per body, ` +
          `Richardson-extrapolated from coarser companion solves and refined until the estimated error is small; ${sectionSolves} distinct section solve${sectionSolves === 1 ? '' : 's'}` +
          (relativeError !== null ? `; estimated discretisation error at most ${formatPercent(relativeError, 2)}` : ''),
        source: 'Wetmode section solver (potential flow, Laplace equation; see the Section screen)',
      };
  }
}

/** Added-mass method(s) used on the submerged zones, then the perforation and 3D end-effect factors when applied. */
export function addedMassLines(member: MemberResult, units: DisplayUnits): SourcedLine[] {
  const methods: AddedMassMethod[] = [];
  for (const z of member.zones) if (z.submerged && z.addedMassMethod && !methods.includes(z.addedMassMethod)) methods.push(z.addedMassMethod);
  const am = member.addedMass;
  const lines = methods.map((m) => methodLine(m, am?.sectionSolves ?? 0, am?.sectionRelativeError ?? null));
  if (am?.perforation) {
    const p = am.perforation;
    lines.push({ text: `Perforation ratio ${formatPercent(p.ratio)}: added mass × ${num(p.factor)}`, source: p.source });
  }
  if (am?.endEffect) {
    const e = am.endEffect;
    lines.push({
      text: `3D end effect (${e.basis}, submerged length ${qty(e.submergedLengthM, units.length)}, width ${qty(e.widthM, units.size)}): added mass × ${num(e.factor)}`,
      source: e.source,
    });
  }
  return lines;
}
