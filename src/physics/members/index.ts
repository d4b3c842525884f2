/**
 * Members: practitioner inputs in SI (pile, riser, baffle, sensor stem) -> the beam engine's member model,
 * plus landmarks, bands and notes for the schematic and the assumptions panel.
 * Each builder validates its input once and throws RangeError naming the field, what was expected and what was got.
 */
import { buildBaffleModel, type BaffleInput } from './baffle';
import { buildPileModel, type PileInput } from './pile';
import { buildRiserModel, type RiserInput } from './riser';
import { buildStemModel, type StemInput } from './stem';
import type { MemberBuild, MemberKind } from './types';

export type * from './types';
export { buildPileModel, validatePileInput, DEFAULT_FIXITY_DIAMETERS, LINEAR_SOIL_STEPS } from './pile';
export type { PileInput, PileFoundation, ResolvedFoundation, MarineGrowth } from './pile';
export { buildRiserModel, validateRiserInput } from './riser';
export type { RiserInput, RiserCaisson } from './riser';
export { buildBaffleModel, validateBaffleInput, PLATE_ENDS, MAX_PERFORATION_RATIO } from './baffle';
export type { BaffleInput, PlateEnd } from './baffle';
export { buildStemModel, validateStemInput } from './stem';
export type { StemInput, StemRoot } from './stem';
export { END_CONDITIONS, endSupports, leavesRigidBodyMotion } from './ends';
export { BEAM_THEORY_CHOICES, STUBBY_LENGTH_TO_DEPTH, resolveBeamTheory } from './theory';
export type { BeamTheory, BeamTheoryChoice } from './theory';
export type { EndCondition } from './ends';

/** The SI input of each member kind. */
export interface MemberInputs {
  pile: PileInput;
  riser: RiserInput;
  baffle: BaffleInput;
  stem: StemInput;
}

export const MEMBER_KINDS: readonly MemberKind[] = ['pile', 'riser', 'baffle', 'stem'];

const BUILDERS: { [K in MemberKind]: (input: MemberInputs[K]) => MemberBuild } = {
  pile: buildPileModel,
  riser: buildRiserModel,
  baffle: buildBaffleModel,
  stem: buildStemModel,
};

/** Builds any kind of member from its SI input; throws RangeError for invalid input. */
export function buildMember<K extends MemberKind>(kind: K, input: MemberInputs[K]): MemberBuild {
  const build = BUILDERS[kind] as ((input: MemberInputs[K]) => MemberBuild) | undefined;
  if (!build) throw new RangeError(`kind must be one of ${MEMBER_KINDS.map((k) => `"${k}"`).join(', ')}, got ${JSON.stringify(kind)}`);
  return build(input);
}
