/**
 * The versioned case schema: one shape for the app, the device store, links, files and the command line.
 *
 * - `parseCase(raw: unknown)` is the only way in: it never throws, migrates older versions step by step
 *   and answers a newer version with `NEWER_VERSION_MESSAGE`.
 * - `sameCaseContent(a, b)` decides "same case" for received links.
 * - `createCase(init)` builds an empty case from an id, a time and the app version.
 * The parts live beside this file.
 */
export * from './types';
export { CASE_LIMITS, cutText } from './limits';
export { isPlainObject } from './fields';
export { parseCase } from './parse';
export { CASE_STEPS, caseV0toV1, caseV1toV2, caseV2toV3, type CaseStep } from './migrations';
export { isRenamedCopy, sameCaseContent } from './compare';
export { createCase, type CaseInit } from './create';
export { caseMeasurements, MEASUREMENT_LIMITS, MEASUREMENT_SOURCES, MEASUREMENT_STATES } from './measurements';
