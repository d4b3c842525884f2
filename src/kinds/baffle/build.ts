/**
 * Baffle: a flat plate strip in a tank, spanning between two supports and bending across its thickness.
 *
 * Geometry along z (metres, up): z = 0 at the lower end of the span, z = spanM at the upper end; the tank floor
 * is at z = −lowerEndAboveFloorM and the liquid surface at z = liquidLevelAboveFloorM − lowerEndAboveFloorM.
 * A horizontal span is modelled the same way: it is either wholly under the liquid or wholly above it.
 * Section convention (src/physics/section): the strip is centred at [0, 0] with its width along y and moves
 * along x (normal to itself). A parallel wall at clear gap g from the plate face is the rigid line
 * x = −(g + t/2), normal [1, 0] pointing into the liquid (towards the plate).
 * End conditions in trade words: welded = clamped, bolted = pinned (a bolted cleat lets the plate rotate),
 * free = no support (common practice, no source).
 */
import type { MemberModel, MemberSegment, MemberSupport } from '../../physics/beam/model';
import { plateStripSection } from '../../physics/shapes/plate-strip';
import { bool, fail, failText, material, nonNegative, oneOf, optional, positive, record } from '../common/check';
import { band, sortLandmarks } from '../common/layout';
import { type BeamTheoryChoice, beamTheoryChoice, resolveBeamTheory, theoryParts } from '../common/theory';
import type { Landmark, MemberBuild } from '../common/types';

export type PlateEnd = 'welded' | 'bolted' | 'free';
export const PLATE_ENDS: readonly PlateEnd[] = ['welded', 'bolted', 'free'];

export interface BaffleInput {
  spanM: number;
  widthM: number;
  thicknessM: number;
  youngsModulusPa: number;
  materialDensityKgPerM3: number;
  /** Poisson's ratio for the plate-strip rigidity D = E t³ / (12 (1 − ν²)) (classical plate theory). */
  poissonRatio: number;
  lowerEnd: PlateEnd;
  upperEnd: PlateEnd;
  /** Height of the lower end of the span above the tank floor, m. Default 0. */
  lowerEndAboveFloorM?: number;
  /** Liquid level above the tank floor, m. */
  liquidLevelAboveFloorM: number;
  liquidDensityKgPerM3: number;
  /** Clear gap from the plate face to the nearest parallel wall, m; absent = no wall nearby. */
  wallGapM?: number;
  /** Open area / total area, 0 to 0.5 (range of DNV-RP-H103 §4.6.4.3). Default 0. */
  perforationRatio?: number;
  endEffect3d?: boolean;
  /** 'auto' (default): Timoshenko beam when length / section depth < 10, else Euler–Bernoulli (theory.ts). */
  beamTheory?: BeamTheoryChoice;
}

/** Upper limit of the perforation ratio (the beam engine's range for DNV-RP-H103 §4.6.4.3). */
export const MAX_PERFORATION_RATIO = 0.5;

function endSupport(end: PlateEnd, atM: number): MemberSupport[] {
  if (end === 'free') return [];
  return [{ atM, kind: end === 'welded' ? 'clamped' : 'pinned' }];
}

export function validateBaffleInput(raw: BaffleInput): BaffleInput {
  const o = record('baffle input', raw);
  const width = positive('widthM', o.widthM);
  const t = positive('thicknessM', o.thicknessM);
  if (!(t < width)) fail('thicknessM', `less than widthM (${width} m): the plate bends across its thickness`, t);
  const nu = o.poissonRatio;
  if (typeof nu !== 'number' || !(nu >= 0 && nu < 0.5)) fail('poissonRatio', 'a finite number from 0 to below 0.5', nu);
  const input: BaffleInput = {
    spanM: positive('spanM', o.spanM),
    widthM: width,
    thicknessM: t,
    ...material(o),
    poissonRatio: nu,
    lowerEnd: oneOf('lowerEnd', o.lowerEnd, PLATE_ENDS),
    upperEnd: oneOf('upperEnd', o.upperEnd, PLATE_ENDS),
    lowerEndAboveFloorM: optional('lowerEndAboveFloorM', o.lowerEndAboveFloorM, nonNegative) ?? 0,
    liquidLevelAboveFloorM: nonNegative('liquidLevelAboveFloorM', o.liquidLevelAboveFloorM),
    liquidDensityKgPerM3: positive('liquidDensityKgPerM3', o.liquidDensityKgPerM3),
    perforationRatio: optional('perforationRatio', o.perforationRatio, nonNegative) ?? 0,
    endEffect3d: optional('endEffect3d', o.endEffect3d, bool) ?? false,
    beamTheory: beamTheoryChoice(o.beamTheory),
  };
  if (!(input.perforationRatio! <= MAX_PERFORATION_RATIO)) {
    fail('perforationRatio', `at most ${MAX_PERFORATION_RATIO} (the range of DNV-RP-H103 §4.6.4.3)`, input.perforationRatio);
  }
  const gap = optional('wallGapM', o.wallGapM, positive);
  if (gap !== undefined) input.wallGapM = gap;
  // Welded at one end holds both motions; otherwise both ends must be bolted (pinned–pinned). A bolted or free
  // end opposite a free end leaves the plate free to swing or drift (a mechanism).
  const { lowerEnd: a, upperEnd: b } = input;
  if (!(a === 'welded' || b === 'welded' || (a === 'bolted' && b === 'bolted'))) {
    failText('lowerEnd and upperEnd', 'enough to hold the plate: one welded end, or both bolted', `"${a}" and "${b}"`);
  }
  return input;
}

export function buildBaffleModel(raw: BaffleInput): MemberBuild {
  const b = validateBaffleInput(raw);
  const L = b.spanM;
  const zFloor = -b.lowerEndAboveFloorM!;
  const zLevel = b.liquidLevelAboveFloorM - b.lowerEndAboveFloorM!;
  const segment: MemberSegment = {
    fromM: 0,
    toM: L,
    section: plateStripSection(b.widthM, b.thicknessM),
    youngsModulusPa: b.youngsModulusPa,
    densityKgPerM3: b.materialDensityKgPerM3,
    poissonRatio: b.poissonRatio,
  };
  const theory = theoryParts(resolveBeamTheory(b.beamTheory!, L, b.thicknessM));
  const model: MemberModel = {
    lengthM: L,
    segments: [segment],
    ...theory.model,
    supports: [...endSupport(b.lowerEnd, 0), ...endSupport(b.upperEnd, L)],
  };
  const wetTo = Math.min(L, zLevel);
  if (wetTo > 0) {
    model.liquid = { densityKgPerM3: b.liquidDensityKgPerM3, fromM: 0, toM: wetTo };
    if (b.wallGapM !== undefined) {
      model.liquid.boundaries = [{ kind: 'wall', pointM: [-(b.wallGapM + b.thicknessM / 2), 0], normal: [1, 0] }];
    }
    if (b.perforationRatio! > 0) model.liquid.perforationRatio = b.perforationRatio;
    if (b.endEffect3d) model.liquid.endEffect3d = true;
  }

  const landmarks: Landmark[] = [
    { id: 'tank-floor', label: 'Tank floor', zM: zFloor },
    { id: 'bottom', label: 'Lower end', zM: 0 },
    { id: 'top', label: 'Upper end', zM: L },
    { id: 'liquid-level', label: 'Liquid level', zM: zLevel },
  ];
  const notes = [
    'The baffle is a plate strip bending across its thickness, D = E t³ / (12 (1 − ν²)) per unit width.',
    'Welded ends are clamped, bolted ends pinned.',
    'The liquid surface is pressure-release (valid well above sloshing frequencies).',
  ];
  notes.push(...theory.notes);
  if (b.perforationRatio! > 0) notes.push('Holes reduce the added mass only; plate mass and stiffness are those of the solid plate.');
  if (b.wallGapM !== undefined) notes.push('The nearby parallel wall confines the liquid over the whole wetted span (2D section solver).');

  return {
    kind: 'baffle',
    model,
    origin: 'lower end of the span',
    landmarks: sortLandmarks(landmarks),
    bands: [
      ...band('submerged', 'In liquid', 0, wetTo, L),
      ...(b.wallGapM !== undefined ? band('confined', 'Near a wall', 0, wetTo, L) : []),
    ],
    ...(b.wallGapM !== undefined ? { confinement: { kind: 'parallel-wall' as const, gapM: b.wallGapM } } : {}),
    notes,
  };
}
