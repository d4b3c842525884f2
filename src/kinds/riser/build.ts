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
import { band, cutSegments, sortLandmarks } from '../common/layout';
import { riserTopTension, tensionNote } from './tension';
import { type BeamTheoryChoice, beamTheoryChoice, resolveBeamTheory, stubbinessLengthM, theoryParts } from '../common/theory';
import type { Landmark, MemberBuild } from '../common/types';

export interface RiserCaisson {
  innerDiameterM: number;
  /** Distance between the riser's and the caisson's centres, m. Default 0 (concentric). */
  offsetM?: number;
  /** Direction of that offset from the direction of motion, degrees. Default 0 (offset along the motion). */
  offsetAngleDeg?: number;
  /**
   * Flow speed inside the caisson, m/s, measured or assumed. Default 0 (still water): the caisson shields the
   * riser from the open current, so shedding inside it is screened with this speed (physics/beam FlowShielding).
   */
  innerFlowMPerS?: number;
  /**
   * Height of the caisson's open bottom above the riser's bottom end, m: the caisson surrounds the riser from
   * here up. Default: the bottom of the water (the whole submerged length).
   */
  fromM?: number;
}

/** Marine growth on the riser's submerged length: adds mass and outer diameter (so added mass), no stiffness. */
export interface RiserGrowth {
  thicknessM: number;
  densityKgPerM3: number;
}

/**
 * What the entered top tension is. 'effective' (default): the tension that governs bending, used as is.
 * 'wall': the true wall tension a load cell reads; the effective tension at the top is then
 * T_eff = T_wall − p_i·A_i + p_e·A_e (R. Sparks, ASME J. Energy Resources Technology 106 (1984) 46), with p_e
 * the hydrostatic pressure at the top (0 above the water).
 */
export type RiserTensionBasis = 'effective' | 'wall';

/** Minimum gap to the caisson wall, as a fraction of the riser's outer radius, below which a warning is given. */
export const SMALL_GAP_FRACTION = 0.05;

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
  /** What `topTensionN` is (see RiserTensionBasis). Default 'effective'. */
  tensionBasis?: RiserTensionBasis;
  /** Internal pressure at the top, Pa (gauge, as the external pressure), for tensionBasis 'wall'. Default 0. */
  internalPressurePa?: number;
  /** Mass at the top end (wellhead, tensioner frame), kg. Default 0. */
  topMassKg?: number;
  marineGrowth?: RiserGrowth;
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
    tensionBasis: o.tensionBasis === undefined ? 'effective' : oneOf('tensionBasis', o.tensionBasis, ['effective', 'wall'] as const),
    internalPressurePa: optional('internalPressurePa', o.internalPressurePa, finite) ?? 0,
    topMassKg: optional('topMassKg', o.topMassKg, nonNegative) ?? 0,
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
  if (o.marineGrowth !== undefined) {
    const g = record('marineGrowth', o.marineGrowth);
    input.marineGrowth = { thicknessM: nonNegative('marineGrowth.thicknessM', g.thicknessM), densityKgPerM3: nonNegative('marineGrowth.densityKgPerM3', g.densityKgPerM3) };
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
    const outer = riserOuterM(input);
    if (!(dc > outer + 2 * e)) {
      fail('caisson.innerDiameterM', `more than the riser's outer diameter with coating and growth plus twice the offset (${num(outer + 2 * e)} m) so the riser fits with a gap`, dc);
    }
    input.caisson = {
      innerDiameterM: dc,
      offsetM: e,
      offsetAngleDeg: optional('caisson.offsetAngleDeg', c.offsetAngleDeg, finite) ?? 0,
      innerFlowMPerS: optional('caisson.innerFlowMPerS', c.innerFlowMPerS, nonNegative) ?? 0,
    };
    const from = optional('caisson.fromM', c.fromM, finite);
    if (from !== undefined) {
      if (!(from < input.liquidToM)) fail('caisson.fromM', `below the water surface (liquidToM, ${num(input.liquidToM)} m)`, from);
      input.caisson.fromM = from;
    }
  }
  const supports = riserSupports(input);
  if (leavesRigidBodyMotion(supports, lengthM, riserTopTension(input).effectiveN > 0 && !input.tensionVariesWithWeight)) {
    failText('bottom, top and guideElevationsM', 'enough support to hold the riser: a clamped end, or two held points (guides or pinned ends)', `bottom "${input.bottom}", top "${input.top}" and ${guides.length} guide(s)`);
  }
  return input;
}

/** Outer diameter with coating and marine growth, m (what the flow and the caisson gap see). */
export function riserOuterM(r: Pick<RiserInput, 'outerDiameterM' | 'coating' | 'marineGrowth'>): number {
  return r.outerDiameterM + 2 * (r.coating?.thicknessM ?? 0) + 2 * (r.marineGrowth?.thicknessM ?? 0);
}

function riserSupports(r: RiserInput): MemberSupport[] {
  return [
    ...endSupports(r.bottom, 0),
    ...r.guideElevationsM.map((atM): MemberSupport => ({ atM, kind: 'pinned' })),
    ...endSupports(r.top, r.lengthM),
  ];
}

/** One layer equal in thickness and mass per metre to a coating with marine growth over it. */
function outsideLayer(d: number, coat: RiserInput['coating'], growth: RiserGrowth | undefined): { thicknessM: number; densityKgPerM3: number } | undefined {
  const tc = coat?.thicknessM ?? 0;
  const tg = growth?.thicknessM ?? 0;
  if (tc + tg <= 0) return undefined;
  if (tg <= 0) return { ...coat! };
  const ring = (inner: number, t: number) => (Math.PI / 4) * ((inner + 2 * t) ** 2 - inner ** 2);
  const mass = (coat?.densityKgPerM3 ?? 0) * ring(d, tc) + (growth?.densityKgPerM3 ?? 0) * ring(d + 2 * tc, tg);
  return { thicknessM: tc + tg, densityKgPerM3: mass / ring(d, tc + tg) };
}

export function buildRiserModel(raw: RiserInput): MemberBuild {
  const r = validateRiserInput(raw);
  const L = r.lengthM;
  const coat = r.coating && r.coating.thicknessM > 0 ? r.coating : undefined;
  const wetFrom = Math.max(0, r.liquidFromM!);
  const wetTo = Math.min(L, r.liquidToM);
  const growth = r.marineGrowth && r.marineGrowth.thicknessM > 0 && wetTo > wetFrom ? r.marineGrowth : undefined;
  // The caisson surrounds the riser from its open bottom (default: the bottom of the water) up.
  const c = r.caisson;
  const caissonFrom = c ? Math.max(wetFrom, c.fromM ?? wetFrom) : wetTo;
  const inCaisson = c !== undefined && wetTo > caissonFrom;
  // Growth lives on the submerged length only; elsewhere the coating alone. Cut also where the caisson starts.
  const cuts = [...(growth ? [wetFrom, wetTo] : []), ...(inCaisson && caissonFrom > wetFrom ? [caissonFrom] : [])];
  const segments = cutSegments(L, cuts, (fromM, toM, mid): MemberSegment => {
    const segment: MemberSegment = {
      fromM,
      toM,
      section: tubeSection(r.outerDiameterM, r.wallThicknessM),
      youngsModulusPa: r.youngsModulusPa,
      densityKgPerM3: r.materialDensityKgPerM3,
    };
    if (r.contentsDensityKgPerM3 > 0) segment.contentsDensityKgPerM3 = r.contentsDensityKgPerM3;
    const layer = outsideLayer(r.outerDiameterM, coat, growth && mid > wetFrom && mid < wetTo ? growth : undefined);
    if (layer) segment.coating = layer;
    return segment;
  });

  const supports = riserSupports(r);
  // Guides split the riser into spans: a short span between guides is stubby even when the riser is not.
  const theory = theoryParts(resolveBeamTheory(r.beamTheory!, stubbinessLengthM(L, supports.filter((s) => s.kind === 'clamped' || s.kind === 'pinned').map((s) => s.atM)), r.outerDiameterM));
  const model: MemberModel = { lengthM: L, segments, supports, ...theory.model };
  const tension = riserTopTension(r);
  if (tension.effectiveN !== 0 || r.tensionVariesWithWeight) model.tensionN = tension.effectiveN;
  if (r.tensionVariesWithWeight) model.tensionVariesWithWeight = true;
  if (r.topMassKg! > 0) model.masses = [{ atM: L, massKg: r.topMassKg! }];

  if (wetTo > wetFrom) {
    model.liquid = { densityKgPerM3: r.liquidDensityKgPerM3, fromM: wetFrom, toM: wetTo };
    if (c && inCaisson) {
      const th = (c.offsetAngleDeg! * Math.PI) / 180;
      const boundary: BoundarySpec = {
        kind: 'enclosure',
        shape: 'circle',
        diameterM: c.innerDiameterM,
        // "+ 0" turns −0 into 0 for a concentric caisson (cleaner JSON, equal under Object.is).
        centerM: [-c.offsetM! * Math.cos(th) + 0, -c.offsetM! * Math.sin(th) + 0],
      };
      model.liquid.boundaries = [boundary];
      if (caissonFrom > wetFrom) model.liquid.boundariesFromM = caissonFrom;
      model.liquid.flowShielding = [{ fromM: caissonFrom, toM: wetTo, flowSpeedMPerS: c.innerFlowMPerS!, label: 'inside the caisson' }];
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
  if (model.masses) landmarks.push({ id: 'mass', label: 'Top mass', zM: L });

  const notes = [
    'Guides hold the riser sideways and let it rotate (pinned).',
    'Contents fill the whole length and move with the riser; they take no added mass.',
    tensionNote(tension, !!r.tensionVariesWithWeight),
  ];
  notes.push(...theory.notes);
  if (growth) notes.push('Marine growth on the submerged length adds mass and outer diameter (so added mass) but no stiffness.');
  if (model.masses) notes.push('The top mass (wellhead, tensioner) moves with the top end; its weight hangs on the tension below it.');
  if (c && !inCaisson) notes.push('The caisson starts above the water: it neither confines the water nor shields the riser.');
  if (c && inCaisson) {
    notes.push(
      caissonFrom > wetFrom
        ? 'The caisson surrounds the riser from its open bottom up and confines the water there (2D section solver); below it the riser is in open water and the current.'
        : 'The caisson surrounds the riser over the whole submerged length and confines the water (2D section solver).',
    );
    notes.push(
      c.innerFlowMPerS! > 0
        ? 'Inside the caisson the riser is shielded from the open current: shedding there is screened with the flow inside as entered.'
        : 'Inside the caisson the riser is shielded from the open current: shedding there is screened in still water (no flow inside entered).',
    );
    const gap = (c.innerDiameterM - riserOuterM(r)) / 2 - c.offsetM!;
    const radius = riserOuterM(r) / 2;
    if (gap < SMALL_GAP_FRACTION * radius) {
      notes.push(
        `Warning: the smallest gap to the caisson wall is ${num(Number((gap * 1000).toPrecision(3)))} mm, under ${SMALL_GAP_FRACTION * 100} % of the riser's radius: ` +
          'the confined added mass is very sensitive to the gap and the offset, and the riser may touch the caisson (contact is not modelled).',
      );
    }
  }

  return {
    kind: 'riser',
    model,
    origin: 'bottom end of the riser',
    landmarks: sortLandmarks(landmarks),
    bands: [
      ...band('submerged', 'In water', wetFrom, wetTo, L),
      ...(growth ? band('marine-growth', 'Marine growth', wetFrom, wetTo, L) : []),
      ...(coat ? band('coating', 'Coating', 0, L, L) : []),
      ...(r.contentsDensityKgPerM3 > 0 ? band('contents', 'Contents', 0, L, L) : []),
      ...(inCaisson ? band('confined', 'Inside caisson', caissonFrom, wetTo, L) : []),
    ],
    ...(inCaisson ? { confinement: { kind: 'surrounding-tube' as const, innerDiameterM: c.innerDiameterM, offsetM: c.offsetM!, offsetAngleDeg: c.offsetAngleDeg! } } : {}),
    notes,
  };
}
