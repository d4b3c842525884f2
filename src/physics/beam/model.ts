/**
 * The member model: one description of a beam-like member, read by
 * `wetmode member FILE` and built by the app's guided forms.
 * z runs along the member axis from 0 (root / bottom) to lengthM. SI units throughout.
 */
import type { BoundarySpec } from '../section/types';

/** The section of a segment: one of the registered shapes (src/physics/shapes). */
export type { MemberSection } from '../shapes/registry';
import type { MemberSection } from '../shapes/registry';

export interface MemberSegment {
  fromM: number;
  toM: number;
  section: MemberSection;
  /** Section at toM for a linear taper; same shape kind as `section`. */
  endSection?: MemberSection;
  youngsModulusPa: number;
  densityKgPerM3: number;
  /** Poisson's ratio (default 0.3): plate-strip rigidity and, for the Timoshenko option, shear modulus. */
  poissonRatio?: number;
  /** Density of the contents of a tube (flooded or filled); 0 or absent = empty/sealed. */
  contentsDensityKgPerM3?: number;
  /** Coating or marine growth: adds mass and outer diameter, no stiffness. */
  coating?: { thicknessM: number; densityKgPerM3: number };
}

export type SupportKind = 'clamped' | 'pinned' | 'guided' | 'free' | 'spring';

export interface MemberSupport {
  atM: number;
  kind: SupportKind;
  /** For kind 'spring' (either or both). */
  translationalStiffnessNPerM?: number;
  rotationalStiffnessNmPerRad?: number;
}

/** Distributed soil springs (subgrade modulus) over an embedded length. */
export interface SoilSprings {
  fromM: number;
  toM: number;
  /** Lateral spring stiffness per metre of pile per metre of deflection, N/m². */
  modulusNPerM2: number;
}

export interface LumpedMass {
  atM: number;
  massKg: number;
  rotaryInertiaKgM2?: number;
}

/**
 * A stretch where the member is shielded from the open flow (a riser inside a caisson or conductor guide, a stem
 * inside its nozzle): vortex-shedding screening uses `flowSpeedMPerS` there instead of the case's current or flow
 * (0 = still water). Added mass is not affected (that is `boundaries`).
 */
export interface FlowShielding {
  fromM: number;
  toM: number;
  flowSpeedMPerS: number;
  /** Plain words for results: "inside the caisson", "inside the nozzle". */
  label: string;
}

export interface MemberLiquid {
  densityKgPerM3: number;
  /** Submerged range along z. */
  fromM: number;
  toM: number;
  /**
   * Surroundings of the member's section in the liquid (confinement), in section
   * coordinates with the member's section centred at [0, 0] and moving along x.
   * Absent = unbounded liquid.
   */
  boundaries?: BoundarySpec[];
  /**
   * The boundaries surround the member only where z ≥ this (a caisson whose open bottom is above the seabed);
   * absent = over the whole liquid range. No segment may straddle it.
   */
  boundariesFromM?: number;
  /** Perforation ratio of a plate (0..1): reduces added mass (DNV-RP-H103 §4.6.4.3). */
  perforationRatio?: number;
  /** Apply the DNV-RP-H103 Table A-2 3D end-effect reduction for short submerged lengths. Default false. */
  endEffect3d?: boolean;
  /**
   * Kinematic viscosity, m²/s, when known from the liquid and its temperature, with where it comes from; the
   * resonance screening then uses it (and this density) for the Reynolds number. Not used for added mass.
   */
  kinematicViscosityM2PerS?: number;
  viscositySource?: string;
  /** Stretches shielded from the open flow; the screening uses their own flow speed (see FlowShielding). */
  flowShielding?: FlowShielding[];
}

export interface MemberModel {
  lengthM: number;
  segments: MemberSegment[];
  liquid?: MemberLiquid;
  supports: MemberSupport[];
  soilSprings?: SoilSprings[];
  masses?: LumpedMass[];
  /** Axial tension, N (negative = compression). */
  tensionN?: number;
  /** Let tension vary with submerged weight along the member (tension given at the top). */
  tensionVariesWithWeight?: boolean;
  /** Number of modes wanted (default 5). */
  modes?: number;
  /**
   * Beam theory: 'euler-bernoulli' (default) or 'timoshenko' (shear deformation and rotary inertia,
   * for stubby members with length / depth below about 10).
   */
  beamTheory?: 'euler-bernoulli' | 'timoshenko';
  /** Mesh refinement controls; the defaults suit field use. */
  mesh?: MeshOptions;
}

/** How the finite-element mesh is chosen and refined. */
export interface MeshOptions {
  /** Elements of the first mesh (default max(12, 3 × modes)); every interval between mesh points gets at least one. */
  initialElements?: number;
  /** Stop doubling when every requested mode changes by less than this fraction (default 5e-4 = 0.05 %). */
  relativeTolerance?: number;
  /** Stop doubling beyond this many elements (default 3200); the result then says it did not converge. */
  maxElements?: number;
  /** false: solve on the first mesh only, no refinement (convergence studies, tests). Default true. */
  refine?: boolean;
}
