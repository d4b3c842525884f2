/** Resonance screening: public surface. See screen.ts for the entry and verdict.ts for the verdict rule. */
export { screenResonance } from './screen';
export { ScreeningInputError } from './input-error';
export { DEFAULT_DAMPING, DEFAULT_LIMITS, FRESH_WATER, SEAWATER } from './defaults';
export { reducedVelocity, reynoldsNumber, sheddingFrequencyHz, speedForReducedVelocity, stabilityParameter } from './formulas';
export { strouhalCircle, strouhalNumber } from './strouhal';
export type { StrouhalRegime, StrouhalValue } from './strouhal';
export { classifyFrequency, compareSeverity, VERDICT_WORDS } from './verdict';
export type { Verdict } from './verdict';
export type * from './types';
export type * from './results';
