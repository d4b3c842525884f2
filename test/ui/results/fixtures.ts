/**
 * Hand-made results for the Results-screen helpers: small, with round numbers that can be checked by hand.
 * Invented members only.
 */
import type { MemberResult, ModeResult, ZoneResult } from '../../../src/physics/beam/result';
import { screenResonance } from '../../../src/physics/excitation';
import type { ScreeningResult } from '../../../src/physics/excitation/results';
import type { BeamSolved } from '../../../src/app/solve-case';
import { pileCase } from '../../physics/excitation/fixtures';

export type Solved = BeamSolved;

function mode(n: number, frequencyHz: number, share?: number): ModeResult {
  const m: ModeResult = {
    mode: n,
    frequencyHz,
    periodS: 1 / frequencyHz,
    modalMassKg: 1000,
    shape: { zM: [0, 10, 20], displacement: [0, 0.4, 1] },
  };
  if (share !== undefined) m.liquidKineticEnergyShare = share;
  return m;
}

export function zone(over: Partial<ZoneResult>): ZoneResult {
  return {
    fromM: 0,
    toM: 15,
    submerged: true,
    tapered: false,
    structureKgPerM: 200,
    contentsKgPerM: 0,
    coatingKgPerM: 0,
    addedKgPerM: 805,
    addedMassCoefficientCa: 1,
    caReferenceArea: 'π D²/4, D = outer diameter including coating',
    addedToDisplacedLiquidMass: 1,
    addedToStructuralMass: 4.025,
    addedMassMethod: 'circle closed form (Lamb)',
    ...over,
  };
}

/** A 20 m member, wet 0–15 m, two modes: dry 0.55 and 3.3 Hz, wet 0.5 and 3.0 Hz. */
export function wetMember(over: Partial<MemberResult> = {}): MemberResult {
  const dry = [mode(1, 0.55), mode(2, 3.3)];
  const wet = [mode(1, 0.5, 0.1), mode(2, 3.0, 0.25)];
  return {
    modesRequested: 2,
    beamTheory: 'euler-bernoulli',
    dry: { frequenciesHz: dry.map((m) => m.frequencyHz), periodsS: dry.map((m) => m.periodS), modes: dry },
    wet: { frequenciesHz: wet.map((m) => m.frequencyHz), periodsS: wet.map((m) => m.periodS), modes: wet },
    wetOmittedBecause: null,
    wetToDryRatio: [0.5 / 0.55, 3.0 / 3.3],
    zones: [zone({}), zone({ fromM: 15, toM: 20, submerged: false, addedKgPerM: 0, addedMassCoefficientCa: null, addedToDisplacedLiquidMass: null, addedToStructuralMass: null, addedMassMethod: null })],
    tension: { varies: false, topN: 0, bottomN: 0, minN: 0, maxN: 0 },
    addedMass: { endEffect: null, perforation: null, sectionSolves: 0, sectionRelativeError: null },
    mesh: { elements: 32, history: [16, 32], converged: true, lastChangePercent: 0.01, relativeTolerance: 5e-4 },
    warnings: [],
    ...over,
  };
}

/** The same member in air only. */
export function dryMember(): MemberResult {
  return wetMember({ wet: null, wetToDryRatio: null, wetOmittedBecause: 'no liquid given' });
}

/**
 * Screening of the standard pile of test/physics/excitation/fixtures.ts (D = 1 m, wet 0–15 m, φ = z/20) at
 * f = 0.5 Hz in a uniform U = 1.5 m/s: V_R = U/(f D) = 3.0, inside the in-line range 1–4.5 and on the lower
 * edge of the cross-flow range 3–16 (DNV-RP-C205 §9).
 */
export function pileScreening(extra: Parameters<typeof pileCase>[2] = {}): ScreeningResult {
  return screenResonance(pileCase(0.5, 1.5, extra));
}

export function solved(member: MemberResult, screening: ScreeningResult | null, screeningError: string | null = null): Solved {
  return { ok: true, member, screening, screeningError, elapsedMs: 1 };
}
