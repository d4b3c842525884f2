/**
 * Riser or conductor: a vertical tube held at guides (pinned lateral supports), with chosen conditions at its
 * bottom and top, optional top tension, and optionally running inside a caisson that confines the liquid.
 *
 * Geometry along z (metres, up): z = 0 at the bottom end, z = lengthM at the top end; guide elevations, the
 * liquid range and the water surface are all heights above the bottom end.
 * Section convention (src/physics/section): the riser is centred at [0, 0] and moves along x; a caisson of
 * inner diameter D_c whose centre is offset by e from the riser's, at angle θ from the direction of motion,
 * is the circular enclosure centred at −e·(cos θ, sin θ) (so the riser sits e from the caisson centre towards θ).
 */
import type { MemberModel, MemberSegment, MemberSupport } from '../../physics/beam/model';
import type { BoundarySpec } from '../../physics/section/types';
import { tubeSection } from '../../physics/shapes/tube';
import { bool, fail, failText, finite, material, nonNegative, num, oneOf, optional, positive, record, tubeWall } from '../common/check';
import { END_CONDITIONS, type EndCondition, endSupports, leavesRigidBodyMotion } from '../common/ends';
import { band, sortLandmarks } from '../common/layout';
import { type BeamTheoryChoice, beamTheoryChoice, resolveBeamTheory, stubbinessLengthM, theoryParts } from '../common/theory';
import type { Landmark, MemberBuild } from '../common/types';

export interface RiserCaisson {
  innerDiameterM: number;
  /** Distance between the riser's and the caisson's centres, m. Default 0 (concentric). */
  offsetM?: number;
  /** Direction of that offset from the direction of motion, degrees. Default 0 (offset along the motion). */
  offsetAngleDeg?: number;
}

export interface RiserInput {
  outerDiameterM: number;
  wallThicknessM: number;
  youngsModulusPa: number;
  materialDensityKgPerM3: number;
  /** Bottom end to top end, m. */
  lengthM: number;
  /** Density of what is inside (0 = empty), kg/m³; fills the whole length. */
  contentsDensityKgPerM3: number;
  /** Coating over the whole length: adds mass and outer diameter, no stiffness. */
  coating?: { thicknessM: number; densityKgPerM3: number };
  /** Heights of the guides above the bottom end, m, strictly between 0 and lengthM; pinned supports. */
  guideElevationsM: number[];
  bottom: EndCondition;
  top: EndCondition;
  /** Tension applied at the top, N (0 = none). */
  topTensionN?: number;
  /**
   * Tension falls from the top by the effective (submerged) weight below it — compression near the bottom when
   * the top tension is small (the beam engine's effective-tension model). Default true.
   */
  tensionVariesWithWeight?: boolean;
  liquidDensityKgPerM3: number;
  /** Liquid range, heights above the bottom end, m. `liquidFromM` default 0; `liquidToM` is the water surface. */
  liquidFromM?: number;
  liquidToM: number;
  caisson?: RiserCaisson;
  endEffect3d?: boolean;
  /** 'auto' (default): Timoshenko beam when length / section depth < 10, else Euler–Bernoulli (theory.ts). */
  beamTheory?: BeamTheoryChoice;
}

/** Relative spacing under which two guides count as the same point. */
const SAME_POINT = 1e-6;

export function validateRiserInput(raw: RiserInput): RiserInput {
  const o = record('riser input', raw);
  const d = positive('outerDiameterM', o.outerDiameterM);
  const lengthM = positive('lengthM', o.lengthM);
  const input: RiserInput = {
    outerDiameterM: d,
    wallThicknessM: tubeWall(d, o.wallThicknessM),
    ...material(o),
    lengthM,
    contentsDensityKgPerM3: nonNegative('contentsDensityKgPerM3', o.contentsDensityKgPerM3),
    guideElevationsM: [],
    bottom: oneOf('bottom', o.bottom, END_CONDITIONS),
    top: oneOf('top', o.top, END_CONDITIONS),
    topTensionN: optional('topTensionN', o.topTensionN, nonNegative) ?? 0,
    tensionVariesWithWeight: optional('tensionVariesWithWeight', o.tensionVariesWithWeight, bool) ?? true,
    liquidDensityKgPerM3: positive('liquidDensityKgPerM3', o.liquidDensityKgPerM3),
    liquidFromM: optional('liquidFromM', o.liquidFromM, finite) ?? 0,
    liquidToM: finite('liquidToM', o.liquidToM),
    endEffect3d: optional('endEffect3d', o.endEffect3d, bool) ?? false,
    beamTheory: beamTheoryChoice(o.beamTheory),
  };
  if (!(input.liquidToM > input.liquidFromM!)) fail('liquidToM', `more than liquidFromM (${input.liquidFromM} m)`, input.liquidToM);
  if (o.coating !== undefined) {
    const c = record('coating', o.coating);
    input.coating = { thicknessM: nonNegative('coating.thicknessM', c.thicknessM), densityKgPerM3: nonNegative('coating.densityKgPerM3', c.densityKgPerM3) };
  }
  if (!Array.isArray(o.guideElevationsM)) fail('guideElevationsM', 'an array of heights (possibly empty)', o.guideElevationsM);
  const guides = (o.guideElevationsM as unknown[]).map((z, i) => {
    const v = finite(`guideElevationsM[${i}]`, z);
    if (!(v > 0 && v < lengthM)) fail(`guideElevationsM[${i}]`, `between 0 and lengthM (${lengthM} m), ends excluded (set the end condition instead)`, v);
    return v;
  });
  const sorted = [...guides].sort((a, b) => a - b);
  for (let i = 1; i < sorted.length; i++) {
    if (sorted[i] - sorted[i - 1] <= SAME_POINT * lengthM) failText('guideElevationsM', 'distinct heights', `${sorted[i]} m twice`);
  }
  input.guideElevationsM = sorted;
  if (o.caisson !== undefined) {
    const c = record('caisson', o.caisson);
    const dc = positive('caisson.innerDiameterM', c.innerDiameterM);
    const e = optional('caisson.offsetM', c.offsetM, nonNegative) ?? 0;
    const outer = d + 2 * (input.coating?.thicknessM ?? 0);
    if (!(dc > outer + 2 * e)) {
      fail('caisson.innerDiameterM', `more than the riser's outer diameter with coating plus twice the offset (${num(outer + 2 * e)} m) so the riser fits with a gap`, dc);
    }
    input.caisson = { innerDiameterM: dc, offsetM: e, offsetAngleDeg: optional('caisson.offsetAngleDeg', c.offsetAngleDeg, finite) ?? 0 };
  }
  const supports = riserSupports(input);
  if (leavesRigidBodyMotion(supports, lengthM, input.topTensionN! > 0 && !input.tensionVariesWithWeight)) {
    failText('bottom, top and guideElevationsM', 'enough support to hold the riser: a clamped end, or two held points (guides or pinned ends)', `bottom "${input.bottom}", top "${input.top}" and ${guides.length} guide(s)`);
  }
  return input;
}

function riserSupports(r: RiserInput): MemberSupport[] {
  return [
    ...endSupports(r.bottom, 0),
    ...r.guideElevationsM.map((atM): MemberSupport => ({ atM, kind: 'pinned' })),
    ...endSupports(r.top, r.lengthM),
  ];
}

export function buildRiserModel(raw: RiserInput): MemberBuild {
  const r = validateRiserInput(raw);
  const L = r.lengthM;
  const coat = r.coating && r.coating.thicknessM > 0 ? r.coating : undefined;
  const segment: MemberSegment = {
    fromM: 0,
    toM: L,
    section: tubeSection(r.outerDiameterM, r.wallThicknessM),
    youngsModulusPa: r.youngsModulusPa,
    densityKgPerM3: r.materialDensityKgPerM3,
  };
  if (r.contentsDensityKgPerM3 > 0) segment.contentsDensityKgPerM3 = r.contentsDensityKgPerM3;
  if (coat) segment.coating = { ...coat };

  const supports = riserSupports(r);
  // Guides split the riser into spans: a short span between guides is stubby even when the riser is not.
  const theory = theoryParts(resolveBeamTheory(r.beamTheory!, stubbinessLengthM(L, supports.filter((s) => s.kind === 'clamped' || s.kind === 'pinned').map((s) => s.atM)), r.outerDiameterM));
  const model: MemberModel = { lengthM: L, segments: [segment], supports, ...theory.model };
  if (r.topTensionN! > 0 || r.tensionVariesWithWeight) model.tensionN = r.topTensionN;
  if (r.tensionVariesWithWeight) model.tensionVariesWithWeight = true;

  const wetFrom = Math.max(0, r.liquidFromM!);
  const wetTo = Math.min(L, r.liquidToM);
  const c = r.caisson;
  if (wetTo > wetFrom) {
    model.liquid = { densityKgPerM3: r.liquidDensityKgPerM3, fromM: wetFrom, toM: wetTo };
    if (c) {
      const th = (c.offsetAngleDeg! * Math.PI) / 180;
      const boundary: BoundarySpec = {
        kind: 'enclosure',
        shape: 'circle',
        diameterM: c.innerDiameterM,
        // "+ 0" turns −0 into 0 for a concentric caisson (cleaner JSON, equal under Object.is).
        centerM: [-c.offsetM! * Math.cos(th) + 0, -c.offsetM! * Math.sin(th) + 0],
      };
      model.liquid.boundaries = [boundary];
    }
    if (r.endEffect3d) model.liquid.endEffect3d = true;
  }

  const landmarks: Landmark[] = [
    { id: 'bottom', label: 'Bottom end', zM: 0 },
    ...r.guideElevationsM.map((zM, i): Landmark => ({ id: 'guide', label: `Guide ${i + 1}`, zM })),
    { id: 'top', label: 'Top end', zM: L },
    { id: 'water-surface', label: 'Water surface', zM: r.liquidToM },
  ];
  if (r.liquidFromM! > 0) landmarks.push({ id: 'liquid-bottom', label: 'Bottom of the water', zM: r.liquidFromM! });

  const notes = [
    'Guides hold the riser sideways and let it rotate (pinned).',
    'Contents fill the whole length and move with the riser; they take no added mass.',
    r.tensionVariesWithWeight
      ? 'Tension is applied at the top and falls downwards by the submerged weight (effective tension).'
      : 'Tension is constant along the riser.',
  ];
  notes.push(...theory.notes);
  if (c) notes.push('The caisson surrounds the riser over the whole submerged length and confines the water (2D section solver).');

  return {
    kind: 'riser',
    model,
    origin: 'bottom end of the riser',
    landmarks: sortLandmarks(landmarks),
    bands: [
      ...band('submerged', 'In water', wetFrom, wetTo, L),
      ...(coat ? band('coating', 'Coating', 0, L, L) : []),
      ...(r.contentsDensityKgPerM3 > 0 ? band('contents', 'Contents', 0, L, L) : []),
      ...(c ? band('confined', 'Inside caisson', wetFrom, wetTo, L) : []),
    ],
    ...(c ? { confinement: { kind: 'surrounding-tube' as const, innerDiameterM: c.innerDiameterM, offsetM: c.offsetM!, offsetAngleDeg: c.offsetAngleDeg! } } : {}),
    notes,
  };
}
