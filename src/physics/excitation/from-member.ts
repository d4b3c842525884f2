/**
 * Glue between the member modal engine and the resonance screening: turns a member model and its
 * solved modes into the screening's modes, submerged zones and mode-weighted effective masses.
 * Kept here so the app, the worker and the command line screen a member the same way.
 */
import type { MemberModel } from '../beam/model';
import type { MemberResult, ZoneResult } from '../beam/result';
import { sectionAt } from '../beam/section-props';
import { shapeOf } from '../shapes/registry';
import type { ScreeningInput, ScreeningMode, SubmergedZone } from './types';

/** What the case adds to the member for screening: everything in ScreeningInput except what comes from the modes. */
export type CaseExcitation = Omit<ScreeningInput, 'modes' | 'zones' | 'effectiveMassKgPerM'>;

/**
 * Submerged zones with the section the flow sees, as its shape describes it (src/physics/shapes: a tube or
 * rod is a circle of its outer diameter including coating, a plate strip a rectangle facing the flow).
 * A tapered zone uses its mid-length size.
 */
export function submergedZones(model: MemberModel, zones: readonly ZoneResult[]): SubmergedZone[] {
  const out: SubmergedZone[] = [];
  for (const z of zones) {
    if (!z.submerged) continue;
    const mid = 0.5 * (z.fromM + z.toM);
    const seg = model.segments.find((s) => mid >= s.fromM && mid <= s.toM)!;
    const t = (mid - seg.fromM) / (seg.toM - seg.fromM);
    const p = sectionAt(seg, t);
    out.push({
      fromM: z.fromM,
      toM: z.toM,
      section: shapeOf(seg.section).flowSection(p),
    });
  }
  return out;
}

/** Total mass per metre (structure + contents + coating + added) of the zone holding z. */
function massAt(zones: readonly ZoneResult[], zM: number): number {
  for (const z of zones) {
    if (zM >= z.fromM && zM <= z.toM) return z.structureKgPerM + z.contentsKgPerM + z.coatingKgPerM + z.addedKgPerM;
  }
  return 0;
}

/**
 * Mode-weighted effective mass per metre, m_e = ∫ m φ² dz / ∫ φ² dz (DNV-RP-C205 §9, as used in the
 * stability parameter K_S), by the trapezoid rule on the mode's nodes with m taken at each panel's middle.
 */
export function effectiveMassKgPerM(zones: readonly ZoneResult[], zM: readonly number[], shape: readonly number[]): number {
  let num = 0;
  let den = 0;
  for (let i = 0; i + 1 < zM.length; i++) {
    const dz = zM[i + 1] - zM[i];
    const phi2 = 0.5 * (shape[i] * shape[i] + shape[i + 1] * shape[i + 1]);
    num += massAt(zones, 0.5 * (zM[i] + zM[i + 1])) * phi2 * dz;
    den += phi2 * dz;
  }
  return den > 0 ? num / den : 0;
}

/**
 * The screening input for a solved member: wet modes (dry frequency alongside), submerged zones,
 * and per-mode effective masses; `excitation` supplies flow, waves, machinery and limits.
 */
export function screeningInputFor(model: MemberModel, result: MemberResult, excitation: CaseExcitation): ScreeningInput {
  const set = result.wet ?? result.dry;
  const modes: ScreeningMode[] = set.modes.map((m, i) => ({
    wetFrequencyHz: m.frequencyHz,
    dryFrequencyHz: result.wet ? result.dry.modes[i]?.frequencyHz : undefined,
    zM: m.shape.zM,
    displacement: m.shape.displacement,
    effectiveMassKgPerM: effectiveMassKgPerM(result.zones, m.shape.zM, m.shape.displacement),
  }));
  return {
    ...excitation,
    modes,
    zones: result.wet ? submergedZones(model, result.zones) : [],
    effectiveMassKgPerM: modes[0]?.effectiveMassKgPerM ?? 0,
  };
}
