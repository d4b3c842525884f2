/**
 * Public surface of the 2D added-mass section solver.
 *
 * `solveSection(input, options?)` returns the 3K×3K added-mass matrix per metre (rows/columns body by
 * body [x, y, rotation about the body's reference point]) with per-body Ca, displaced mass, error
 * estimates and, on request, the kinetic-energy cross-check. Method and error estimate: solve.ts.
 * Invalid input throws (validate.ts); numerical failure returns `{ ok: false, reason, message }`.
 */
export type * from './types';
export { solveSection, solveSectionDetailed, DEFAULT_PANELS_PER_BODY, type SolvedSection } from './solve';
export { solveSectionMemo, clearSectionMemo, MEMO_ENTRIES } from './memo';
export { parseSectionInput } from './parse';
export { validateSectionInput } from './validate';
export { flowFieldInto, flowField, type FlowFieldGrid, type FlowFieldResult } from './flow-map';
