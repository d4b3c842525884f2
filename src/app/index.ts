/**
 * The application service: one set of use cases for the worker, the UI and the command line.
 *   readCase(case)      -> the member build and resonance inputs, or messages by field (read-case.ts)
 *   solveCase(request)  -> modes dry and wet and the resonance screening (solve-case.ts)
 *   blankCase, caseFromDemo -> new cases from a kind's module (create-case.ts)
 *   solveSectionRequest -> one 2D section's added mass and flow map, for the Section view (solve-section.ts)
 */
export { readCase, requestOf, type CaseReading } from './read-case';
export { solveCase, type CaseAnswer, type CaseRequest } from './solve-case';
export { blankCase, caseFromDemo } from './create-case';
export { createSectionMemo, solveSectionRequest, type SectionAnswer, type SectionRequest } from './solve-section';
