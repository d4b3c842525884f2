/**
 * What a cross-section shape of a beam member supplies, in one place (one module per shape, listed in
 * registry.ts). The beam engine, the excitation glue and the app ask these descriptions; nothing else tests
 * a shape's name. Convention of the section solver (src/physics/section): the section is centred at [0, 0]
 * and the member moves along x as it bends.
 */
import type { BodySpec } from '../section/types';

/** Properties at one station, SI units. */
export interface SectionAt {
  /** Bending stiffness E·I (plate strip: D·width with D = E t³ / (12 (1 − ν²))), N·m². */
  eiNm2: number;
  /** Mass per metre of the structure (steel), kg/m. */
  structureKgPerM: number;
  /** Mass per metre of the contents of a tube, kg/m. */
  contentsKgPerM: number;
  /** Mass per metre of coating or marine growth, kg/m. */
  coatingKgPerM: number;
  /** Outer width across the motion including coating (tube/rod: diameter; plate strip: width), m. */
  outerWidthM: number;
  /** Reference area for the added-mass coefficient, π (outerWidth/2)², m². */
  referenceAreaM2: number;
  /** Outer area of the section including coating (displaced liquid per metre / density), m². */
  displacedAreaM2: number;
  /** Section depth in the direction of motion (tube/rod: diameter; plate strip: thickness), m. */
  depthM: number;
  /** Shear stiffness κ G A of the structure, N (Timoshenko option). */
  shearStiffnessN: number;
  /** Rotary inertia per metre of structure, contents and coating rotating with the section, kg·m²/m. */
  rotaryInertiaKgM: number;
}

/** Material and layers at a station, as the beam engine reads them from a segment. */
export interface SectionMaterial {
  youngsModulusPa: number;
  densityKgPerM3: number;
  poissonRatio: number;
  /** Shear modulus G = E / (2 (1 + ν)), Pa. */
  shearModulusPa: number;
  /** Coating or marine growth thickness (0 = none), m, and its density, kg/m³. */
  coatingM: number;
  coatingDensityKgPerM3: number;
  /** Density of the contents of a hollow section (0 = empty), kg/m³. */
  contentsDensityKgPerM3: number;
}

/** How the added mass of a submerged segment is found. */
export type AddedMassMethod = 'circle closed form (Lamb)' | 'flat plate closed form (Lamb)' | 'annulus closed form (Fritz)' | 'section solver';

/** The section the flow sees, for vortex shedding (src/physics/excitation). */
export type FlowSection = { kind: 'circle'; outerDiameterM: number } | { kind: 'rectangle'; widthAcrossFlowM: number; depthAlongFlowM: number };

/** A failed cross-field check: the field, what was expected, the value got. */
export interface ShapeCheckFailure {
  field: string;
  expected: string;
  got: number;
}

/** One cross-section shape. `S` is its section object: `{ shape: id, ...dimensions, ...choices }`. */
export interface ShapeDescription<S extends { shape: string }> {
  id: S['shape'];
  /** Dimension fields, each a finite number > 0, m, in the order the member validator reads them. */
  dimensions: readonly (Exclude<keyof S, 'shape'> & string)[];
  /** Fields that hold one of a few words (e.g. the bending axis), with the words allowed. */
  choices: { readonly [field: string]: readonly string[] };
  /** Checks the dimensions against each other once they are each > 0; null when they agree. */
  check(s: S): ShapeCheckFailure | null;
  /** True for a closed hollow section that can hold contents (a tube). */
  holdsContents: boolean;
  /** Section properties with the material and layers at a station. */
  props(s: S, m: SectionMaterial): SectionAt;
  /** The same shape with every dimension at a + (b − a)·t (a linear taper); choices are taken from `a`. */
  lerp(a: S, b: S, t: number): S;
  /** The bare section's depth along the motion (drawn width of the schematic), m. */
  depthM(s: S): number;
  /** The section as a section-solver body centred at the origin, moving along x, coating grown outwards. */
  solverBody(s: S, coatingM: number): BodySpec;
  /** The flow section for shedding, from the station properties (width across the motion, depth along it). */
  flowSection(p: SectionAt): FlowSection;
  /** Closed form in unbounded liquid (Ca = 1 on π (w/2)²); null: the section solver is used even in open liquid. */
  closedForm: Exclude<AddedMassMethod, 'section solver' | 'annulus closed form (Fritz)'> | null;
  /** Perforation (open area) reduces the added mass (flat plates). */
  perforable: boolean;
  /** Basis of the 3D end-effect table; null: no tabulated factor for this shape. */
  endEffectBasis: 'circular cylinder' | 'rectangular plate' | null;
  /** The reference area of Ca in words, for the zone table. */
  caReferenceArea: string;
  /** A warning about the limits of the model for this section in liquid, or null. */
  wetWarning(s: S): string | null;
}
