/**
 * Welch's averaged periodogram: the record is cut into segments of L samples overlapping by half, each segment has
 * its mean removed and is multiplied by a Hann window, and the squared magnitudes of their Fourier transforms are
 * averaged (P. D. Welch, "The use of fast Fourier transform for the estimation of power spectra: a method based on
 * time averaging over short, modified periodograms", IEEE Trans. Audio Electroacoustics AU-15 (1967) 70-73).
 * Averaging K segments cuts the scatter of each spectral value roughly by √K; the price is a resolution of fs/L.
 */
import { fftPlan, nextPowerOfTwo, previousPowerOfTwo } from './fft-cache';

/** A one-sided power spectral density. */
export interface WelchSpectrum {
  /** Power spectral density at frequencies k·resolutionHz, k = 0 .. L/2, (input units)² per Hz. */
  psd: Float64Array;
  /** Bin spacing fs / L, Hz. */
  resolutionHz: number;
  /** Segment length L, samples (a power of two). */
  segmentLength: number;
  /** Number of segments averaged. */
  segments: number;
}

/** Shortest segment: 32 samples, so that the shortest accepted record (64 samples) still averages three segments. */
export const MIN_SEGMENT = 32;

/**
 * Picks L, a power of two. With no requested resolution: the longest L that still gives at least seven half-
 * overlapping segments (L ≤ n/4), a common balance between scatter and resolution (common practice, no source).
 * With a requested resolution Δf: the shortest L with fs/L ≤ Δf, but never longer than n/2 (three segments);
 * the note says when the record is too short for the resolution asked for.
 */
export function chooseSegmentLength(n: number, rateHz: number, requestedResolutionHz?: number): { length: number; note: string | null } {
  const longest = Math.max(MIN_SEGMENT, previousPowerOfTwo(Math.floor(n / 2)));
  if (requestedResolutionHz === undefined) return { length: Math.max(MIN_SEGMENT, previousPowerOfTwo(Math.floor(n / 4))), note: null };
  const wanted = Math.max(MIN_SEGMENT, nextPowerOfTwo(Math.ceil(rateHz / requestedResolutionHz)));
  if (wanted <= longest) return { length: wanted, note: null };
  return {
    length: longest,
    note:
      `the record is too short for a resolution of ${requestedResolutionHz} Hz: got ${round(rateHz / longest)} Hz; ` +
      `a record of at least ${round((2 * wanted) / rateHz)} s would give it`,
  };
}

/** Hann window, periodic form w_i = ½(1 − cos 2πi/L) (F. J. Harris, "On the use of windows for harmonic analysis with the discrete Fourier transform", Proc. IEEE 66 (1978) 51-83). */
function hann(length: number): Float64Array {
  const w = new Float64Array(length);
  for (let i = 0; i < length; i++) w[i] = 0.5 * (1 - Math.cos((2 * Math.PI * i) / length));
  return w;
}

/** Welch PSD of an evenly sampled signal `x` (at least `segmentLength` samples) at `rateHz`. */
export function welchPsd(x: Float64Array, rateHz: number, segmentLength: number): WelchSpectrum {
  const L = segmentLength;
  const half = L / 2;
  const w = hann(L);
  let wSquared = 0;
  for (let i = 0; i < L; i++) wSquared += w[i] * w[i];
  const plan = fftPlan(L);
  const seg = new Float64Array(L);
  const spec = new Float64Array(2 * L); // interleaved re, im
  const acc = new Float64Array(half + 1);
  const segments = Math.floor((x.length - L) / half) + 1;
  for (let s = 0; s < segments; s++) {
    const o = s * half;
    let mean = 0;
    for (let i = 0; i < L; i++) mean += x[o + i];
    mean /= L;
    for (let i = 0; i < L; i++) seg[i] = (x[o + i] - mean) * w[i];
    plan.realTransform(spec, seg);
    for (let k = 0; k <= half; k++) acc[k] += spec[2 * k] * spec[2 * k] + spec[2 * k + 1] * spec[2 * k + 1];
  }
  // One-sided density: 2|X_k|² / (fs Σw²) per segment, DC and Nyquist not doubled (Welch 1967, eq. for P̂ with U = Σw²/L).
  const scale = 2 / (rateHz * wSquared * segments);
  for (let k = 0; k <= half; k++) acc[k] *= k === 0 || k === half ? scale / 2 : scale;
  return { psd: acc, resolutionHz: rateHz / L, segmentLength: L, segments };
}

function round(v: number): number {
  return Number(v.toPrecision(3));
}
