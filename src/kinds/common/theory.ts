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

/**
 * The length that decides stubbiness: the shortest bending half-wavelength the supports impose. Between two
 * supports (at `supportsAtM`) a mode's half-wavelength is at most the span; an overhang of length a to a free
 * end bends as a cantilever, a quarter-wave, so its half-wavelength is about 2a (classical mode shapes,
 * docs/sources.md §S1). With no interior supports it is the member length (clamped or pinned at both ends) or
 * twice it (one free end), so a single-span member is judged as before, by its whole length at most.
 */
export function stubbinessLengthM(lengthM: number, supportsAtM: readonly number[]): number {
  const at = [...new Set(supportsAtM.filter((z) => z >= 0 && z <= lengthM))].sort((a, b) => a - b);
  if (at.length < 2) return lengthM;
  let shortest = Infinity;
  for (let i = 1; i < at.length; i++) if (at[i] - at[i - 1] > 0) shortest = Math.min(shortest, at[i] - at[i - 1]);
  const below = at[0];
  const above = lengthM - at[at.length - 1];
  if (below > 0) shortest = Math.min(shortest, 2 * below);
  if (above > 0) shortest = Math.min(shortest, 2 * above);
  return Number.isFinite(shortest) ? Math.min(shortest, lengthM) : lengthM;
}

/** The model field and the note for a resolved theory (nothing for the engine's default, Euler–Bernoulli). */
export function theoryParts(theory: BeamTheory): { model: { beamTheory?: BeamTheory }; notes: string[] } {
  return theory === 'timoshenko'
    ? { model: { beamTheory: 'timoshenko' }, notes: ['Shear deformation and rotary inertia are included (Timoshenko beam), as the member is stubby.'] }
    : { model: {}, notes: [] };
}
