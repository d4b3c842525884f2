/**
 * Sensor stem: a cantilever (thermowell, probe) reaching into a pipe or vessel full of process liquid.
 *
 * Geometry along z (metres): z = 0 at the support face (where the stem leaves the pipe or vessel wall, or its
 * nozzle weld), z = insertionLengthM at the tip. The diameter tapers linearly from root to tip; the bore is
 * constant (a straight drilled hole), 0 for a solid bar. The whole insertion length is in the liquid.
 * Confinement: an optional rigid tube around the stem and coaxial with it (a sleeve, a stilling well, or a pipe
 * the stem lies along), inner diameter D_s: the circular enclosure centred at [0, 0] in the section solver's
 * convention (stem centred at the origin, moving along x). A pipe the stem is inserted across does not enclose
 * its section and is not confinement in this sense.
 * Root: rigid = clamped; otherwise held in position with a rotational spring (flexible nozzle or flange).
 */
import type { MemberModel, MemberSection, MemberSegment, MemberSupport } from '../../physics/beam/model';
import { rodSection } from '../../physics/shapes/rod';
import { tubeSection } from '../../physics/shapes/tube';
import { WATER_TEMPERATURE_RANGE_C, waterProperties } from '../../physics/practice/liquid-properties';
import { bool, fail, finite, material, nonNegative, num, optional, positive, record } from '../common/check';
import { band, sortLandmarks } from '../common/layout';
import { type BeamTheoryChoice, beamTheoryChoice, resolveBeamTheory, theoryParts } from '../common/theory';
import type { Landmark, MemberBuild } from '../common/types';

export type StemRoot = { kind: 'rigid' } | { kind: 'rotational-spring'; stiffnessNmPerRad: number };

export interface StemInput {
  insertionLengthM: number;
  rootDiameterM: number;
  tipDiameterM: number;
  /** Diameter of the bore, m; 0 = solid. */
  boreDiameterM: number;
  youngsModulusPa: number;
  materialDensityKgPerM3: number;
  /** Sensor or tip mass, kg. Default 0. */
  tipMassKg?: number;
  liquidDensityKgPerM3: number;
  /** Inner diameter of a coaxial tube around the stem (confinement), m; absent = open liquid. */
  surroundingInnerDiameterM?: number;
  rootSupport: StemRoot;
  /**
   * Water temperature, °C (10–60): density and viscosity of water from the table in
   * physics/practice/liquid-properties.ts (CRC Handbook, Properties of water) replace liquidDensityKgPerM3.
   */
  waterTemperatureC?: number;
  /** Length from the support face inside a nozzle or standoff, m: no flow over it (still liquid). Default 0. */
  shieldedLengthM?: number;
  endEffect3d?: boolean;
  /** 'auto' (default): Timoshenko beam when length / section depth < 10, else Euler–Bernoulli (theory.ts). */
  beamTheory?: BeamTheoryChoice;
}

export function validateStemInput(raw: StemInput): StemInput {
  const o = record('stem input', raw);
  const root = positive('rootDiameterM', o.rootDiameterM);
  const tip = positive('tipDiameterM', o.tipDiameterM);
  const bore = nonNegative('boreDiameterM', o.boreDiameterM);
  if (!(bore < Math.min(root, tip))) fail('boreDiameterM', `less than the smaller of rootDiameterM and tipDiameterM (${num(Math.min(root, tip))} m)`, bore);
  const r = record('rootSupport', o.rootSupport);
  let rootSupport: StemRoot;
  if (r.kind === 'rigid') rootSupport = { kind: 'rigid' };
  else if (r.kind === 'rotational-spring') rootSupport = { kind: 'rotational-spring', stiffnessNmPerRad: positive('rootSupport.stiffnessNmPerRad', r.stiffnessNmPerRad) };
  else return fail('rootSupport.kind', 'one of "rigid", "rotational-spring"', r.kind);
  const input: StemInput = {
    insertionLengthM: positive('insertionLengthM', o.insertionLengthM),
    rootDiameterM: root,
    tipDiameterM: tip,
    boreDiameterM: bore,
    ...material(o),
    tipMassKg: optional('tipMassKg', o.tipMassKg, nonNegative) ?? 0,
    liquidDensityKgPerM3: positive('liquidDensityKgPerM3', o.liquidDensityKgPerM3),
    rootSupport,
    shieldedLengthM: optional('shieldedLengthM', o.shieldedLengthM, nonNegative) ?? 0,
    endEffect3d: optional('endEffect3d', o.endEffect3d, bool) ?? false,
    beamTheory: beamTheoryChoice(o.beamTheory),
  };
  if (!(input.shieldedLengthM! < input.insertionLengthM)) fail('shieldedLengthM', `less than insertionLengthM (${num(input.insertionLengthM)} m)`, input.shieldedLengthM);
  const temp = optional('waterTemperatureC', o.waterTemperatureC, finite);
  if (temp !== undefined) {
    const [lo, hi] = WATER_TEMPERATURE_RANGE_C;
    if (!(temp >= lo && temp <= hi)) fail('waterTemperatureC', `within ${lo}–${hi} °C (the range of the water table)`, temp);
    input.waterTemperatureC = temp;
  }
  const s = optional('surroundingInnerDiameterM', o.surroundingInnerDiameterM, positive);
  if (s !== undefined) {
    if (!(s > Math.max(root, tip))) fail('surroundingInnerDiameterM', `more than the stem's largest diameter (${num(Math.max(root, tip))} m)`, s);
    input.surroundingInnerDiameterM = s;
  }
  return input;
}

function stemSection(diameterM: number, boreM: number): MemberSection {
  return boreM > 0 ? tubeSection(diameterM, (diameterM - boreM) / 2) : rodSection(diameterM);
}

export function buildStemModel(raw: StemInput): MemberBuild {
  const s = validateStemInput(raw);
  const L = s.insertionLengthM;
  const segment: MemberSegment = {
    fromM: 0,
    toM: L,
    section: stemSection(s.rootDiameterM, s.boreDiameterM),
    youngsModulusPa: s.youngsModulusPa,
    densityKgPerM3: s.materialDensityKgPerM3,
  };
  // Linear taper in diameter with a constant bore: the wall thickness also varies linearly, (D(z) − d)/2,
  // which is what the beam engine's linear interpolation of (D, t) between the two sections gives.
  if (s.tipDiameterM !== s.rootDiameterM) segment.endSection = stemSection(s.tipDiameterM, s.boreDiameterM);

  // A flexible root keeps its position (the nozzle is short and stiff sideways) and rotates against a
  // spring: a pinned support plus a rotational spring at the same point (the beam engine adds them).
  const supports: MemberSupport[] =
    s.rootSupport.kind === 'rigid'
      ? [{ atM: 0, kind: 'clamped' }]
      : [
          { atM: 0, kind: 'pinned' },
          { atM: 0, kind: 'spring', rotationalStiffnessNmPerRad: s.rootSupport.stiffnessNmPerRad },
        ];
  const theory = theoryParts(resolveBeamTheory(s.beamTheory!, L, Math.max(s.rootDiameterM, s.tipDiameterM)));
  const model: MemberModel = {
    lengthM: L,
    segments: [segment],
    supports,
    ...theory.model,
    liquid: { densityKgPerM3: s.liquidDensityKgPerM3, fromM: 0, toM: L },
  };
  const water = s.waterTemperatureC !== undefined ? waterProperties(s.waterTemperatureC) : null;
  if (water) {
    model.liquid!.densityKgPerM3 = water.densityKgPerM3;
    model.liquid!.kinematicViscosityM2PerS = water.kinematicViscosityM2PerS;
    model.liquid!.viscositySource = `water at ${num(s.waterTemperatureC!)} °C: ρ = ${num(Number(water.densityKgPerM3.toPrecision(5)))} kg/m³, ν = ${num(Number(water.kinematicViscosityM2PerS.toPrecision(4)))} m²/s (CRC Handbook of Chemistry and Physics, Properties of water; interpolated)`;
  }
  const shielded = Math.min(s.shieldedLengthM!, L);
  if (shielded > 0) model.liquid!.flowShielding = [{ fromM: 0, toM: shielded, flowSpeedMPerS: 0, label: 'inside the nozzle' }];
  if (s.surroundingInnerDiameterM !== undefined) {
    model.liquid!.boundaries = [{ kind: 'enclosure', shape: 'circle', diameterM: s.surroundingInnerDiameterM }];
  }
  if (s.endEffect3d) model.liquid!.endEffect3d = true;
  if (s.tipMassKg! > 0) model.masses = [{ atM: L, massKg: s.tipMassKg! }];

  const landmarks: Landmark[] = [
    { id: 'root', label: 'Support face', zM: 0 },
    { id: 'tip', label: 'Tip', zM: L },
  ];
  if (model.masses) landmarks.push({ id: 'mass', label: 'Tip mass', zM: L });
  const notes = [
    s.rootSupport.kind === 'rigid' ? 'The stem is clamped at the support face.' : 'The stem is held at the support face and rotates against a spring.',
    'The whole insertion length is in the liquid; the bore is empty.',
    'The tip mass is a point mass at the tip, without rotary inertia.',
  ];
  notes.push(...theory.notes);
  if (s.surroundingInnerDiameterM !== undefined) notes.push('A coaxial tube around the stem confines the liquid (2D section solver).');
  if (water) notes.push(`Liquid: ${model.liquid!.viscositySource}; the density entered is not used.`);
  if (shielded > 0) notes.push('Inside the nozzle (from the support face) the stem sees no flow: shedding there is screened in still liquid. The nozzle\'s confinement of the liquid is not modelled.');

  return {
    kind: 'stem',
    model,
    origin: 'support face of the stem',
    landmarks: sortLandmarks(landmarks),
    bands: [
      ...band('submerged', 'In liquid', 0, L, L),
      ...(shielded > 0 ? band('confined', 'Inside the nozzle (no flow)', 0, shielded, L) : []),
      ...(s.surroundingInnerDiameterM !== undefined ? band('confined', 'Inside a surrounding tube', 0, L, L) : []),
    ],
    ...(s.surroundingInnerDiameterM !== undefined
      ? { confinement: { kind: 'surrounding-tube' as const, innerDiameterM: s.surroundingInnerDiameterM, offsetM: 0, offsetAngleDeg: 0 } }
      : {}),
    notes,
  };
}
