/** Uncertain inputs: ranges, the frequency band, sensitivity, the verdict over the band, and calibration. */
export { memberBand, parametricBand, DEFAULT_MAX_SOLVES } from './band';
export type { ModelAt } from './evaluate';
export type { BandOptions } from './band';
export type * from './band-types';
export { resolveRanges, MAX_RANGED_INPUTS } from './ranges';
export type { InputRange, ResolvedRange } from './ranges';
export { getNumberAt, withNumberAt, withNumbersAt, pathKeys } from './paths';
export { judgeOverBand, classifyInterval, switchText } from './band-verdict';
export type { BandVerdict, CheckOverBand, VerdictSwitch, FrequencyRange } from './band-verdict';
export { screenBand } from './band-screening';
export type { BandScreeningOptions, BandScreeningOutcome } from './band-screening';
export { calibrate, checkCalibrationInput } from './calibrate';
export type { CalibrationOptions, CalibrationOutcome, Measurement, Unknown } from './calibrate';
export { brentZero, brentMinimum } from './brent';
export type { RootOutcome, MinimumOutcome } from './brent';
