/** Output of the member modal engine (SI units; field names carry units). */
import type { AddedMassMethod } from './added-mass';

export interface ModeShape {
  /** Node positions along the member, m. */
  zM: number[];
  /**
   * Lateral displacement at the nodes, normalised so that the largest |value| is 1 and positive; where equal and
   * opposite peaks tie (within a relative 1e-6), the one nearest z = 0 is the positive one.
   */
  displacement: number[];
}

export interface ModeResult {
  /** 1-based mode number. */
  mode: number;
  frequencyHz: number;
  periodS: number;
  /** Generalised mass φᵀMφ for the shape normalised to max |w| = 1, kg. */
  modalMassKg: number;
  /** Wet only: share of the mode's kinetic energy carried by the liquid's added mass (0..1). */
  liquidKineticEnergyShare?: number;
  shape: ModeShape;
}

export interface ModeSetResult {
  frequenciesHz: number[];
  periodsS: number[];
  modes: ModeResult[];
}

/** Mass per metre of one zone of the member (between segment ends and liquid range ends). */
export interface ZoneResult {
  fromM: number;
  toM: number;
  submerged: boolean;
  /** True when the zone lies in a tapered segment: the values are averages over the zone. */
  tapered: boolean;
  structureKgPerM: number;
  contentsKgPerM: number;
  coatingKgPerM: number;
  addedKgPerM: number;
  /** Added mass / (ρ × reference area) = Ca; reference area stated in `caReferenceArea`. Null when dry. */
  addedMassCoefficientCa: number | null;
  caReferenceArea: string;
  /** Added mass / mass of liquid displaced by the outer section (= Ca for a round section). Null when dry. */
  addedToDisplacedLiquidMass: number | null;
  /** Added mass / structural (steel) mass per metre. Null when dry. */
  addedToStructuralMass: number | null;
  addedMassMethod: AddedMassMethod | null;
}

export interface MeshReport {
  /** Elements of the mesh whose frequencies are reported. */
  elements: number;
  /** Element counts tried, coarse to fine. */
  history: number[];
  converged: boolean;
  /** Largest relative change of any requested mode at the last doubling, percent (null if refinement was off). */
  lastChangePercent: number | null;
  relativeTolerance: number;
}

export interface MemberResult {
  modesRequested: number;
  beamTheory: 'euler-bernoulli' | 'timoshenko';
  dry: ModeSetResult;
  /** Null when the member has no liquid (see `wetOmittedBecause`). */
  wet: ModeSetResult | null;
  wetOmittedBecause: string | null;
  /** f_wet / f_dry per mode number; null when dry only. */
  wetToDryRatio: number[] | null;
  zones: ZoneResult[];
  tension: { varies: boolean; topN: number; bottomN: number; minN: number; maxN: number };
  addedMass: {
    endEffect: { factor: number; basis: string; submergedLengthM: number; widthM: number; source: string } | null;
    perforation: { ratio: number; factor: number; source: string } | null;
    sectionSolves: number;
    /** Largest estimated relative discretisation error of the section-solver added masses (null when none used). */
    sectionRelativeError: number | null;
    /**
     * Wet frequencies with that error carried through, per mode (present when a section solve gave an
     * estimate): the added mass of the solved sections raised / lowered by the relative error.
     */
    wetFrequencyBand?: { lowHz: number[]; highHz: number[]; largestRelativeHalfWidth: number };
  } | null;
  mesh: MeshReport;
  warnings: string[];
}

export type MemberFailureReason = 'buckles' | 'mechanism' | 'not-converged' | 'section-solver-failed';

export type MemberOutcome = { ok: true; result: MemberResult } | { ok: false; reason: MemberFailureReason; message: string };
