/**
 * Which beam theory a member gets. Euler–Bernoulli leaves out shear deformation and rotary inertia, which lower
 * the frequencies of stubby members; common practice sets the line at length / section depth ≈ 10 (docs/sources.md §S13), the same
 * line at which the beam engine warns. 'auto' takes Timoshenko below it.
 */
import { oneOf } from './check';

export type BeamTheory = 'euler-bernoulli' | 'timoshenko';
export type BeamTheoryChoice = 'auto' | BeamTheory;
export const BEAM_THEORY_CHOICES: readonly BeamTheoryChoice[] = ['auto', 'euler-bernoulli', 'timoshenko'];

/** Length / section depth below which 'auto' includes shear deformation (common practice, docs/sources.md §S13). */
export const STUBBY_LENGTH_TO_DEPTH = 10;

/** Checks `beamTheory` (absent = 'auto'). */
export function beamTheoryChoice(v: unknown): BeamTheoryChoice {
  return v === undefined ? 'auto' : oneOf('beamTheory', v, BEAM_THEORY_CHOICES);
}

/** The theory to use for a member of this length and largest section depth (diameter, or plate thickness). */
export function resolveBeamTheory(choice: BeamTheoryChoice, lengthM: number, depthM: number): BeamTheory {
  if (choice !== 'auto') return choice;
  return lengthM / depthM < STUBBY_LENGTH_TO_DEPTH ? 'timoshenko' : 'euler-bernoulli';
}

/** The model field and the note for a resolved theory (nothing for the engine's default, Euler–Bernoulli). */
export function theoryParts(theory: BeamTheory): { model: { beamTheory?: BeamTheory }; notes: string[] } {
  return theory === 'timoshenko'
    ? { model: { beamTheory: 'timoshenko' }, notes: ['Shear deformation and rotary inertia are included (Timoshenko beam), as the member is stubby.'] }
    : { model: {}, notes: [] };
}
