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

/** Pieces a tapered zone is cut into for shedding, each with its own (smaller-end) size. */
export const TAPER_SHEDDING_STEPS = 8;

/**
 * Submerged zones with the section the flow sees, as its shape describes it (src/physics/shapes: a tube or
 * rod is a circle of its outer diameter including coating, a plate strip a rectangle facing the flow).
 * A tapered zone is cut into TAPER_SHEDDING_STEPS pieces, each sized at its smaller end: the piece at a tapered
 * stem's tip then sheds at the tip diameter, as thermowell practice takes it (ASME PTC 19.3 TW-2010 uses the tip
 * diameter for the shedding frequency), where a mid-length size would understate f_s = St·U/D.
 * Zones are also cut where a shielded stretch (liquid.flowShielding) begins or ends; a piece inside one carries
 * its flow speed and label, in place of the case's flow.
 */
export function submergedZones(model: MemberModel, zones: readonly ZoneResult[]): SubmergedZone[] {
  const out: SubmergedZone[] = [];
  const shields = model.liquid?.flowShielding ?? [];
  const eps = 1e-9 * model.lengthM;
  for (const z of zones) {
    if (!z.submerged) continue;
    const mid = 0.5 * (z.fromM + z.toM);
    const seg = model.segments.find((s) => mid >= s.fromM && mid <= s.toM)!;
    const steps = seg.endSection ? TAPER_SHEDDING_STEPS : 1;
    const cuts = new Set<number>();
    for (let k = 0; k <= steps; k++) cuts.add(z.fromM + ((z.toM - z.fromM) * k) / steps);
    for (const sh of shields) for (const c of [sh.fromM, sh.toM]) if (c > z.fromM + eps && c < z.toM - eps) cuts.add(c);
    const pts = [...cuts].sort((a, b) => a - b);
    for (let i = 0; i + 1 < pts.length; i++) {
      const a = pts[i];
      const b = pts[i + 1];
      if (b - a <= eps) continue;
      const sizeAt = (zM: number) => shapeOf(seg.section).flowSection(sectionAt(seg, (zM - seg.fromM) / (seg.toM - seg.fromM)));
      let section = sizeAt(0.5 * (a + b));
      if (seg.endSection) {
        const sa = sizeAt(a);
        const sb = sizeAt(b);
        section = flowSizeM(sa) <= flowSizeM(sb) ? sa : sb;
      }
      const piece: SubmergedZone = { fromM: a, toM: b, section };
      const c = 0.5 * (a + b);
      const sh = shields.find((x) => c > x.fromM && c < x.toM);
      if (sh) {
        piece.flowSpeedMPerS = sh.flowSpeedMPerS;
        piece.shieldedBy = sh.label;
      }
      out.push(piece);
    }
  }
  return out;
}

function flowSizeM(s: SubmergedZone['section']): number {
  return s.kind === 'circle' ? s.outerDiameterM : s.widthAcrossFlowM;
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
  // A member whose liquid carries its own viscosity (a stem in water at a known temperature) is screened with it.
  const liq = model.liquid;
  const liquid =
    liq?.kinematicViscosityM2PerS !== undefined
      ? { densityKgPerM3: liq.densityKgPerM3, kinematicViscosityM2PerS: liq.kinematicViscosityM2PerS, source: liq.viscositySource ?? 'viscosity as given with the member' }
      : excitation.liquid;
  return {
    ...excitation,
    ...(liquid ? { liquid } : {}),
    modes,
    zones: result.wet ? submergedZones(model, result.zones) : [],
    effectiveMassKgPerM: modes[0]?.effectiveMassKgPerM ?? 0,
  };
}
