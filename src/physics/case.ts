/**
 * The versioned case schema: one shape for the app, the device store, links, files and the command line.
 *
 * - `parseCase(raw: unknown)` is the only way in: it never throws, migrates older versions step by step
 *   and answers a newer version with `NEWER_VERSION_MESSAGE`.
 * - `sameCaseContent(a, b)` decides "same case" for received links.
 * - `createCase(init)` builds an empty case from an id, a time and the app version.
 * The parts live in `./case/`.
 */
export * from './case/types';
export { CASE_LIMITS, cutText } from './case/limits';
export { isPlainObject } from './case/fields';
export { parseCase } from './case/parse';
export { CASE_STEPS, caseV0toV1, type CaseStep } from './case/migrations';
export { isRenamedCopy, sameCaseContent } from './case/compare';
export { createCase, type CaseInit } from './case/create';
