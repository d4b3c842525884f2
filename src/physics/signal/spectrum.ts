/**
 * From a motion record to its peaks: resample to an even grid, take out gravity and drift, Welch-average the power
 * spectrum of each axis, add the axes, find the peaks, and estimate each peak's damping.
 *
 * Axes are combined by adding their spectra: the sum is the trace of the cross-spectral matrix, which does not
 * change when the sensor is turned (classical: the trace is invariant under rotation), so a mode shows at full
 * strength whichever way the tablet or logger was held or clamped, and no axis needs to be chosen first. Each peak
 * also names the axis where it is strongest; its free decay is fitted on that axis.
 */
import { checkRecordSize, type MotionRecord, type RecordFailureReason } from './record';
import { removeLinearTrendInPlace } from './detrend';
import { resampleUniform } from './resample';
import { chooseSegmentLength, welchPsd } from './welch';
import { findSpectrumPeaks } from './peaks';
import { bandEnvelope, fitFreeDecay, paddedSpectrum, type PaddedSpectrum } from './free-decay';
import type { SpectrumAnalysis, SpectrumOptions, PeakReport } from './spectrum-types';

export type { SpectrumAnalysis, SpectrumOptions, PeakReport } from './spectrum-types';

const DEFAULTS = { minQualityDb: 10, maxPeaks: 8 };
/** Bins below this are not searched: the Hann window spreads what is left of gravity and drift over bins 0 and 1. */
const FIRST_BIN = 2;

/** Analyses a record; never throws for a record that does not suit (typed failure), throws RangeError for bad options. */
export function analyseMotionRecord(record: MotionRecord, options: SpectrumOptions = {}): SpectrumAnalysis | { ok: false; reason: RecordFailureReason; message: string } {
  checkOptions(options);
  const bad = checkRecord(record);
  if (bad) return { ok: false, ...bad };
  const minQualityDb = options.minQualityDb ?? DEFAULTS.minQualityDb;
  const maxPeaks = options.maxPeaks ?? DEFAULTS.maxPeaks;

  const grid = resampleUniform(record.timeS, record.axes);
  const { rateHz, timing } = grid;
  for (const a of grid.axes) removeLinearTrendInPlace(a);
  const seg = chooseSegmentLength(grid.n, rateHz, options.resolutionHz);
  const axisPsd = grid.axes.map((a) => welchPsd(a, rateHz, seg.length));
  const first = axisPsd[0];
  const psd = new Float64Array(first.psd.length);
  for (const s of axisPsd) for (let k = 0; k < psd.length; k++) psd[k] += s.psd[k];
  const resolutionHz = first.resolutionHz;

  const found = findSpectrumPeaks(psd, resolutionHz, { firstBin: FIRST_BIN, minQualityDb, maxPeaks });
  const spectra = new Map<number, PaddedSpectrum>();
  const peaks: PeakReport[] = found.map((p) => {
    let axis = 0;
    for (let a = 1; a < axisPsd.length; a++) if (axisPsd[a].psd[p.bin] > axisPsd[axis].psd[p.bin]) axis = a;
    let spectrum = spectra.get(axis);
    if (!spectrum) {
      spectrum = paddedSpectrum(grid.axes[axis], rateHz);
      spectra.set(axis, spectrum);
    }
    // Band: ±5 % of the frequency (a mode with ζ up to about 0.05 keeps its half-power width inside), at least two
    // bins, and no more than 0.4 of the way to the nearest other peak so that only this mode is left.
    const nearest = Math.min(...found.filter((q) => q !== p).map((q) => Math.abs(q.frequencyHz - p.frequencyHz)), Infinity);
    const halfBandHz = Math.min(Math.max(0.05 * p.frequencyHz, 2 * resolutionHz), 0.4 * nearest);
    const decay = fitFreeDecay(bandEnvelope(spectrum, p.frequencyHz, halfBandHz), rateHz, p.frequencyHz, halfBandHz);
    const hp = p.halfPower;
    const dampingMethod = decay.found ? 'free-decay' : hp.resolved ? 'half-power' : null;
    return {
      frequencyHz: p.frequencyHz,
      dampingRatio: decay.found ? decay.dampingRatio : hp.resolved ? hp.dampingRatio : null,
      dampingMethod,
      qualityDb: p.qualityDb,
      psd: p.psd,
      floorPsd: p.floorPsd,
      strongestAxis: record.axisNames[axis] ?? `axis ${axis + 1}`,
      halfPower: hp.resolved
        ? { dampingRatio: hp.dampingRatio, lowHz: hp.lowHz, highHz: hp.highHz, note: decay.found ? 'the record is a free decay, for which the averaged spectrum narrows the peak; the free-decay value is preferred' : null }
        : { dampingRatio: null, lowHz: hp.lowHz, highHz: hp.highHz, note: hp.why },
      freeDecay: decay.found
        ? { dampingRatio: decay.dampingRatio, fromS: decay.fromS, toS: decay.toS, cycles: decay.cycles, rSquared: decay.rSquared, note: null }
        : { dampingRatio: null, fromS: null, toS: null, cycles: null, rSquared: null, note: decay.why },
    };
  });

  const nyquistHz = rateHz / 2;
  const durationS = record.timeS[record.timeS.length - 1] - record.timeS[0];
  const notes = [
    `the highest frequency this record can show is ${fmt(nyquistHz)} Hz (half its sample rate); a mode above it is missed or folds down to a false lower frequency`,
  ];
  if (timing.intervalJitter > 0.01) notes.push(`the samples were not evenly timed (interval scatter ${fmt(100 * timing.intervalJitter)} %); they were put on an even ${fmt(rateHz)} Hz grid by straight-line interpolation`);
  if (timing.longestGapS > 5 * timing.medianIntervalS) notes.push(`a gap of ${fmt(timing.longestGapS)} s at ${fmt(timing.longestGapAtS)} s into the record was bridged by a straight line`);
  if (rateHz < 5) notes.push(`the samples are ${fmt(1 / rateHz)} s apart: if the time column is in milliseconds, convert it to seconds`);
  if (seg.note) notes.push(seg.note);
  if (peaks.length === 0) notes.push(`no peak stands ${minQualityDb} dB above the noise floor between ${fmt(FIRST_BIN * resolutionHz)} and ${fmt(nyquistHz)} Hz`);

  return {
    ok: true,
    sampleRateHz: rateHz,
    meanRateHz: timing.meanRateHz,
    intervalJitter: timing.intervalJitter,
    durationS,
    resolutionHz,
    nyquistHz,
    lowestFrequencyHz: FIRST_BIN * resolutionHz,
    segmentLength: seg.length,
    segments: first.segments,
    psd,
    axisPsd: axisPsd.map((s) => s.psd),
    axisNames: record.axisNames.slice(),
    peaks,
    notes,
  };
}

function checkOptions(o: SpectrumOptions): void {
  if (o.resolutionHz !== undefined && !(Number.isFinite(o.resolutionHz) && o.resolutionHz > 0)) throw new RangeError(`resolutionHz must be a positive number of hertz, got ${String(o.resolutionHz)}`);
  if (o.minQualityDb !== undefined && !Number.isFinite(o.minQualityDb)) throw new RangeError(`minQualityDb must be a number of decibels, got ${String(o.minQualityDb)}`);
  if (o.maxPeaks !== undefined && !(Number.isInteger(o.maxPeaks) && o.maxPeaks >= 1)) throw new RangeError(`maxPeaks must be a whole number ≥ 1, got ${String(o.maxPeaks)}`);
}

function checkRecord(r: MotionRecord): { reason: RecordFailureReason; message: string } | null {
  const n = r.timeS.length;
  if (r.axes.length < 1 || r.axes.length > 3) return { reason: r.axes.length < 1 ? 'one-column' : 'too-many-columns', message: `expected one to three acceleration axes, got ${r.axes.length}` };
  for (let a = 0; a < r.axes.length; a++) {
    if (r.axes[a].length !== n) return { reason: 'bad-rows', message: `axis ${a + 1} has ${r.axes[a].length} samples, expected ${n} (one per time)` };
    for (let i = 0; i < n; i++) if (!Number.isFinite(r.axes[a][i])) return { reason: 'bad-rows', message: `sample ${i + 1} of axis ${a + 1} is ${r.axes[a][i]}, expected a finite number` };
  }
  for (let i = 1; i < n; i++) {
    if (!(r.timeS[i] > r.timeS[i - 1])) return { reason: 'time-not-increasing', message: `time must increase from sample to sample; sample ${i + 1} goes from ${r.timeS[i - 1]} s to ${r.timeS[i]} s` };
  }
  return checkRecordSize(r.timeS);
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(3)));
}
