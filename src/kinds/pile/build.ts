/**
 * Pile: a vertical steel tube from the seabed up through the water to a deck or a free top.
 *
 * Geometry along z (metres, up):
 *   z = 0             effective fixity point (clamped), or the pile toe with soil springs;
 *   z_mud             mudline after scour = fixity depth below it (default 6 D, or Davisson & Robinson's from the
 *                     soil type), or the embedded length less the scour;
 *   z_swl             still water level = z_mud + scourDepthM + waterDepthM (the reference level, e.g. mean sea
 *                     level; the water depth is to the original mudline);
 *   z_surface         water surface = z_swl + waterLevelOffsetM (tide or surge; the pile does not move);
 *   lengthM           pile top = z_swl + topAboveStillWaterM (measured from the reference level, not the tide).
 * The liquid runs from the mudline to the water surface (clipped to the top if the pile is overtopped).
 */
import type { MemberModel, MemberSegment, MemberSupport, SoilSprings } from '../../physics/beam/model';
import { tubeSection } from '../../physics/shapes/tube';
import { davissonRobinsonFixity, type FixityDepth } from '../../physics/practice/fixity';
import { SOIL_PRESETS, type SoilPresetId } from '../../physics/practice/soil-presets';
import { bool, fail, finite, material, nonNegative, num, oneOf, optional, positive, record, tubeWall } from '../common/check';
import { band, cutSegments, sortLandmarks } from '../common/layout';
import { type BeamTheoryChoice, beamTheoryChoice, resolveBeamTheory, theoryParts } from '../common/theory';
import type { Landmark, MemberBuild } from '../common/types';
import { headSupports, type PileHead, readHead } from './head';

export type { PileHead } from './head';

/** Marine growth over a band of elevations; adds mass and outer diameter (so added mass), no stiffness. */
export interface MarineGrowth {
  thicknessM: number;
  densityKgPerM3: number;
  /** Top of the band above the still water level, m (negative = below it). */
  topAboveStillWaterM: number;
  /** Bottom of the band below the still water level, m; clipped at the mudline. */
  bottomBelowStillWaterM: number;
}

export type PileFoundation =
  /** Clamped at an equivalent depth below the mudline; default 6 × outer diameter (common practice, range 3.5–8 D). */
  | { kind: 'fixity'; depthBelowMudlineM?: number }
  /**
   * Clamped at Davisson & Robinson's depth to fixity for a soil preset (physics/practice/fixity.ts); the
   * embedded length, when given, is checked against the method's long-pile condition.
   */
  | { kind: 'fixity-soil'; soil: SoilPresetId; embeddedLengthM?: number }
  /** Winkler springs of constant subgrade modulus k (N/m per metre of pile per metre of deflection) over the embedded length, free toe. */
  | { kind: 'soil-springs'; embeddedLengthM: number; modulusNPerM2: number }
  /** Winkler springs rising linearly with depth, k = n_h × depth below the mudline (sands), free toe. */
  | { kind: 'soil-springs-linear'; embeddedLengthM: number; modulusGradientNPerM3: number };

export interface PileInput {
  outerDiameterM: number;
  wallThicknessM: number;
  youngsModulusPa: number;
  materialDensityKgPerM3: number;
  /** Mudline to the still water level, m (≥ 0). */
  waterDepthM: number;
  /** Pile top above the still water level, m; negative when the top is under water. */
  topAboveStillWaterM: number;
  /** Tide or surge offset of the water surface from the still water level, m (+ up). Default 0. */
  waterLevelOffsetM?: number;
  /** Default: fixity at 6 × outer diameter below the mudline. */
  foundation?: PileFoundation;
  /** Deck share or other mass at the top, kg. Default 0. */
  topMassKg?: number;
  /** Scour below the original mudline, m: moves the mudline, and the soil support, down. Default 0. */
  scourDepthM?: number;
  /** How the deck holds the pile head. Default free. */
  head?: PileHead;
  /** Axial compression carried by the pile (deck load), N; enters as constant compression (P-Δ). Default 0. */
  axialCompressionN?: number;
  /** Rotary inertia of the top mass about a horizontal axis through the pile top, kg·m². Default 0. */
  topRotaryInertiaKgM2?: number;
  /** true: free-flooding (water inside up to the outside water surface); false: sealed and empty. */
  flooded: boolean;
  liquidDensityKgPerM3: number;
  marineGrowth?: MarineGrowth;
  /** Apply the 3D end-effect reduction of added mass (beam engine, DNV-RP-H103 Table A-2). Default false. */
  endEffect3d?: boolean;
  /** 'auto' (default): Timoshenko beam when length / section depth < 10, else Euler–Bernoulli (theory.ts). */
  beamTheory?: BeamTheoryChoice;
}

/** Default fixity depth in outer diameters below the mudline (common practice, 3.5–8 D: docs/sources.md §S9). */
export const DEFAULT_FIXITY_DIAMETERS = 6;
/** Steps used to represent springs that rise linearly with depth by piecewise-constant ranges. */
export const LINEAR_SOIL_STEPS = 10;

/** A foundation with the fixity depth filled in. */
export type ResolvedFoundation =
  | { kind: 'fixity'; depthBelowMudlineM: number; method?: FixityDepth }
  | Exclude<PileFoundation, { kind: 'fixity' } | { kind: 'fixity-soil' }>;

/** Bending stiffness of the pile's tube, N·m²: E·π(D⁴ − D_i⁴)/64 (classical). */
function tubeEI(d: number, t: number, e: number): number {
  const di = d - 2 * t;
  return (e * Math.PI * (d ** 4 - di ** 4)) / 64;
}

function foundation(v: unknown, outerDiameterM: number, eiNm2: number): ResolvedFoundation {
  if (v === undefined) return { kind: 'fixity', depthBelowMudlineM: DEFAULT_FIXITY_DIAMETERS * outerDiameterM };
  const f = record('foundation', v);
  if (f.kind === 'fixity-soil') {
    const soil = oneOf('foundation.soil', f.soil, Object.keys(SOIL_PRESETS) as SoilPresetId[]);
    const le = optional('foundation.embeddedLengthM', f.embeddedLengthM, positive);
    // Without an embedded length the long-pile condition cannot be checked; it is taken as met and said so.
    const method = davissonRobinsonFixity(eiNm2, SOIL_PRESETS[soil].modulus, le ?? Number.MAX_VALUE);
    return { kind: 'fixity', depthBelowMudlineM: method.depthM, method: { ...method, longEnough: le === undefined ? true : method.longEnough } };
  }
  if (f.kind === 'fixity') {
    const d = optional('foundation.depthBelowMudlineM', f.depthBelowMudlineM, nonNegative);
    return { kind: 'fixity', depthBelowMudlineM: d ?? DEFAULT_FIXITY_DIAMETERS * outerDiameterM };
  }
  if (f.kind === 'soil-springs') {
    return {
      kind: 'soil-springs',
      embeddedLengthM: positive('foundation.embeddedLengthM', f.embeddedLengthM),
      modulusNPerM2: positive('foundation.modulusNPerM2', f.modulusNPerM2),
    };
  }
  if (f.kind === 'soil-springs-linear') {
    return {
      kind: 'soil-springs-linear',
      embeddedLengthM: positive('foundation.embeddedLengthM', f.embeddedLengthM),
      modulusGradientNPerM3: positive('foundation.modulusGradientNPerM3', f.modulusGradientNPerM3),
    };
  }
  return fail('foundation.kind', 'one of "fixity", "fixity-soil", "soil-springs", "soil-springs-linear"', f.kind);
}

function growth(v: unknown): MarineGrowth | undefined {
  if (v === undefined) return undefined;
  const g = record('marineGrowth', v);
  const out: MarineGrowth = {
    thicknessM: nonNegative('marineGrowth.thicknessM', g.thicknessM),
    densityKgPerM3: nonNegative('marineGrowth.densityKgPerM3', g.densityKgPerM3),
    topAboveStillWaterM: finite('marineGrowth.topAboveStillWaterM', g.topAboveStillWaterM),
    bottomBelowStillWaterM: finite('marineGrowth.bottomBelowStillWaterM', g.bottomBelowStillWaterM),
  };
  if (!(out.topAboveStillWaterM > -out.bottomBelowStillWaterM)) {
    fail('marineGrowth.bottomBelowStillWaterM', `more than −topAboveStillWaterM (${num(-out.topAboveStillWaterM)} m) so the band has a height`, out.bottomBelowStillWaterM);
  }
  return out;
}

/** Checks a pile input and returns a clean copy with defaults filled in; throws RangeError naming the field. */
export function validatePileInput(raw: PileInput): PileInput & { foundation: ResolvedFoundation } {
  const o = record('pile input', raw);
  const d = positive('outerDiameterM', o.outerDiameterM);
  const wall = tubeWall(d, o.wallThicknessM);
  const mat = material(o);
  const h = nonNegative('waterDepthM', o.waterDepthM);
  const top = finite('topAboveStillWaterM', o.topAboveStillWaterM);
  if (!(top > -h)) fail('topAboveStillWaterM', `more than −waterDepthM (${num(-h)} m) so the top is above the mudline`, top);
  const input: PileInput & { foundation: ResolvedFoundation } = {
    outerDiameterM: d,
    wallThicknessM: wall,
    ...mat,
    waterDepthM: h,
    topAboveStillWaterM: top,
    waterLevelOffsetM: optional('waterLevelOffsetM', o.waterLevelOffsetM, finite) ?? 0,
    foundation: foundation(o.foundation, d, tubeEI(d, wall, mat.youngsModulusPa)),
    scourDepthM: optional('scourDepthM', o.scourDepthM, nonNegative) ?? 0,
    head: readHead(o.head),
    axialCompressionN: optional('axialCompressionN', o.axialCompressionN, nonNegative) ?? 0,
    topMassKg: optional('topMassKg', o.topMassKg, nonNegative) ?? 0,
    topRotaryInertiaKgM2: optional('topRotaryInertiaKgM2', o.topRotaryInertiaKgM2, nonNegative) ?? 0,
    flooded: bool('flooded', o.flooded),
    liquidDensityKgPerM3: positive('liquidDensityKgPerM3', o.liquidDensityKgPerM3),
    endEffect3d: optional('endEffect3d', o.endEffect3d, bool) ?? false,
    beamTheory: beamTheoryChoice(o.beamTheory),
  };
  const g = growth(o.marineGrowth);
  if (g) input.marineGrowth = g;
  const f = input.foundation;
  if (f.kind !== 'fixity' && !(input.scourDepthM! < f.embeddedLengthM)) {
    fail('scourDepthM', `less than foundation.embeddedLengthM (${num(f.embeddedLengthM)} m) so some of the pile stays in the soil`, input.scourDepthM);
  }
  return input;
}

/**
 * Winkler ranges for the foundation, z = 0 at the toe, the (scoured) mudline at z = embedded length − scour:
 * scour removes the soil above, so the springs start at the new mudline and a sand's modulus rises from zero
 * there (depth measured from the scoured surface, common practice, no source).
 */
function soilRanges(f: ResolvedFoundation, scourM: number): SoilSprings[] {
  if (f.kind === 'soil-springs') return [{ fromM: 0, toM: f.embeddedLengthM - scourM, modulusNPerM2: f.modulusNPerM2 }];
  if (f.kind !== 'soil-springs-linear') return [];
  // k(depth) = n_h · depth, depth = L_e − z. Each step carries the mean of k over it, n_h · (mid-depth), so the
  // total spring and its first moment about the step are exact; only the linear variation inside a step is lost.
  const le = f.embeddedLengthM - scourM;
  const out: SoilSprings[] = [];
  for (let i = 0; i < LINEAR_SOIL_STEPS; i++) {
    const fromM = (le * i) / LINEAR_SOIL_STEPS;
    const toM = (le * (i + 1)) / LINEAR_SOIL_STEPS;
    out.push({ fromM, toM, modulusNPerM2: f.modulusGradientNPerM3 * (le - 0.5 * (fromM + toM)) });
  }
  return out;
}

/** Builds the member model of a pile; see the file comment for the geometry. */
export function buildPileModel(raw: PileInput): MemberBuild {
  const p = validatePileInput(raw);
  const f = p.foundation;
  const scour = p.scourDepthM!;
  // zMud is the mudline after scour (where the soil support starts); the original mudline is `scour` above it.
  const zMud = f.kind === 'fixity' ? f.depthBelowMudlineM : f.embeddedLengthM - scour;
  const zOriginalMud = zMud + scour;
  const zSwl = zOriginalMud + p.waterDepthM;
  const zSurface = zSwl + p.waterLevelOffsetM!;
  const lengthM = zSwl + p.topAboveStillWaterM;
  const wetTop = Math.min(zSurface, lengthM);

  const g = p.marineGrowth && p.marineGrowth.thicknessM > 0 ? p.marineGrowth : undefined;
  // Growth lives on the pile's wetted outside: from the given depth (but not below the mudline) up to its top.
  const gFrom = g ? Math.max(zMud, zSwl - g.bottomBelowStillWaterM) : 0;
  const gTo = g ? Math.min(lengthM, zSwl + g.topAboveStillWaterM) : 0;

  // Flooded: a free-flooding pile (open toe or vent holes) has its inside level equal to the outside water
  // surface (hydrostatics, classical), so it carries liquid from z = 0 up to the surface and air above, whose
  // mass (~1.2 kg/m³) is neglected. Below the mudline the plug is really saturated soil (~1900–2000 kg/m³);
  // we carry the liquid there too: in the fixity model that stretch is a notional length that hardly moves
  // (common practice, no source). Sealed: empty.
  const contentsTop = p.flooded ? Math.max(0, wetTop) : 0;

  const segments = cutSegments(lengthM, [contentsTop, gFrom, gTo], (fromM, toM, mid): MemberSegment => {
    const seg: MemberSegment = {
      fromM,
      toM,
      section: tubeSection(p.outerDiameterM, p.wallThicknessM),
      youngsModulusPa: p.youngsModulusPa,
      densityKgPerM3: p.materialDensityKgPerM3,
    };
    if (mid < contentsTop) seg.contentsDensityKgPerM3 = p.liquidDensityKgPerM3;
    if (g && mid > gFrom && mid < gTo) seg.coating = { thicknessM: g.thicknessM, densityKgPerM3: g.densityKgPerM3 };
    return seg;
  });

  const theory = theoryParts(resolveBeamTheory(p.beamTheory!, lengthM, p.outerDiameterM));
  const model: MemberModel = {
    lengthM,
    segments,
    ...theory.model,
    // Fixity model: the equivalent cantilever is clamped at the fixity point (common practice). Springs: free toe.
    supports: [...(f.kind === 'fixity' ? [{ atM: 0, kind: 'clamped' as const }] : []), ...headSupports(p.head!, lengthM)],
  };
  // Axial load as constant compression (negative tension) over the pile: P-Δ lowers the bending stiffness.
  if (p.axialCompressionN! > 0) model.tensionN = -p.axialCompressionN!;
  const soil = soilRanges(f, scour);
  if (soil.length > 0) model.soilSprings = soil;
  if (p.topMassKg! > 0 || p.topRotaryInertiaKgM2! > 0) {
    model.masses = [{ atM: lengthM, massKg: p.topMassKg!, ...(p.topRotaryInertiaKgM2! > 0 ? { rotaryInertiaKgM2: p.topRotaryInertiaKgM2 } : {}) }];
  }
  if (wetTop > zMud) {
    model.liquid = { densityKgPerM3: p.liquidDensityKgPerM3, fromM: zMud, toM: wetTop, ...(p.endEffect3d ? { endEffect3d: true } : {}) };
  }

  const landmarks: Landmark[] = [
    f.kind === 'fixity' ? { id: 'fixity', label: 'Effective fixity', zM: 0 } : { id: 'toe', label: 'Pile toe', zM: 0 },
    { id: 'mudline', label: 'Mudline', zM: zMud },
    { id: 'still-water', label: 'Still water level', zM: zSwl },
    { id: 'top', label: 'Pile top', zM: lengthM },
  ];
  if (scour > 0) landmarks.push({ id: 'mudline', label: 'Mudline before scour', zM: zOriginalMud });
  if (p.waterLevelOffsetM !== 0) landmarks.push({ id: 'water-surface', label: 'Water surface with offset', zM: zSurface });
  if (model.masses) landmarks.push({ id: 'mass', label: 'Top mass', zM: lengthM });

  const notes = [
    f.kind !== 'fixity'
      ? 'The embedded length rests on lateral soil springs (Winkler subgrade modulus); the toe is free.'
      : f.method
        ? `The pile is clamped at the depth to fixity of ${f.method.method} (M.T. Davisson & K.E. Robinson, 6th ICSMFE, 1965): ${num(Number(f.method.depthM.toPrecision(3)))} m below the mudline.`
        : 'The pile is clamped at an effective fixity point below the mudline (equivalent cantilever; 3.5 to 8 diameters is usual, 6 is common practice).',
    'Water acts on the pile from the mudline to the water surface; the tide offset moves the water, not the pile.',
    p.flooded
      ? 'Flooded: water inside up to the outside water surface, air above it.'
      : 'Sealed: the pile is empty inside.',
    p.axialCompressionN! > 0
      ? 'The axial load entered acts as constant compression over the pile (P-Δ); self-weight is not added to it.'
      : 'Axial load from the top mass and self-weight is not included.',
  ];
  if (f.kind === 'fixity' && f.method && !f.method.longEnough) {
    notes.push(`Warning: the embedded length is under 4 stiffness lengths (4 × ${num(Number(f.method.stiffnessLengthM.toPrecision(3)))} m): Davisson & Robinson's depth to fixity assumes a long pile.`);
  }
  if (scour > 0) notes.push('Scour lowers the mudline: the soil support starts at the scoured level and water fills the scour hole.');
  if (p.head!.kind === 'held') notes.push('The deck holds the pile head against rotation; the head is free to sway.');
  if (p.head!.kind === 'spring') notes.push('The deck restrains the pile head\'s rotation by a rotational spring; the head is free to sway.');
  if (g) notes.push('Marine growth adds mass and outer diameter (so added mass) but no stiffness.');
  notes.push(...theory.notes);

  return {
    kind: 'pile',
    model,
    origin: f.kind === 'fixity' ? 'effective fixity point below the mudline' : 'pile toe',
    landmarks: sortLandmarks(landmarks),
    bands: [
      ...band('embedded', f.kind === 'fixity' ? 'Below mudline to fixity' : 'Embedded on soil springs', 0, zMud, lengthM),
      ...band('submerged', 'In water', zMud, wetTop, lengthM),
      ...(g ? band('marine-growth', 'Marine growth', gFrom, gTo, lengthM) : []),
      ...band('flooded', 'Flooded inside', 0, contentsTop, lengthM),
    ],
    notes,
  };
}
