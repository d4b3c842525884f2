/** Member modal engine: public entry points and lower-level building blocks. */
export { solveMember, DEFAULT_MODES, DEFAULT_RELATIVE_TOLERANCE, DEFAULT_MAX_ELEMENTS } from './solve-member';
export type { SolveMemberOptions } from './solve-member';
export { parseMemberModel, MAX_MODES } from './validate';
export type * from './model';
export type * from './result';
export type { SectionSolver, SectionSolverOutcome } from './section-bridge';
export { MECHANISM_MESSAGE } from './restraint';
// Lower-level API (tests, benchmarks, studies): fixed meshes, assembled matrices, rigid-body modes allowed.
export { buildMesh, initialCounts, meshBreakpoints } from './mesh';
export type { Mesh } from './mesh';
export { assembleMember, HALF_BANDWIDTH } from './assemble';
export type { MemberSystem } from './assemble';
export { planAddedMass } from './added-mass';
export { sectionAt, cowperCircle, cowperRectangle } from './section-props';
export { perforationFactor, cylinderEndEffectFactor, plateEndEffectFactor, plateTableCa } from './reductions';
export { GRAVITY } from './tension';
