/**
 * Motion records and their spectra: read a logger file, gather a tablet's motion samples, find the peaks.
 *
 *   const r = parseMotionRecord(text);                 // { ok: true, record, notes } | { ok: false, reason, message }
 *   const s = analyseMotionRecord(r.record, { resolutionHz: 0.05 }); // peaks strongest first, notes
 */
export { parseMotionRecord } from './read-record';
export { RECORD_LIMITS, checkRecordSize, type MotionRecord, type RecordResult, type RecordFailureReason } from './record';
export { analyseMotionRecord, type SpectrumAnalysis, type SpectrumOptions, type PeakReport } from './spectrum';
export { resampleUniform, sampleTiming, type SampleTiming, type UniformRecord } from './resample';
export { welchPsd, chooseSegmentLength, type WelchSpectrum } from './welch';
export { MotionRecorder, type MotionSample, type MotionSource, type MotionTrace, type PushOutcome, type Triple } from './motion-recorder';
