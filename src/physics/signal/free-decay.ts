/**
 * Damping from a free decay: the record is band-passed around one peak, its envelope taken as the magnitude of the
 * analytic signal (the Hilbert transform, classical), and a straight line fitted to the logarithm of the envelope
 * as it falls after its largest value. For a lightly damped mode the envelope falls as e^(−ζωₙt), so the slope is
 * −σ = −ζωₙ and ζ = σ / √(σ² + ω_d²) (classical logarithmic decrement, fitted over many cycles instead of two).
 * This is the estimate to trust after a tap or a push; for a member driven steadily by wind, waves or machinery
 * there is no decay to fit and the half-power width is used instead.
 */
import { fftPlan, nextPowerOfTwo } from './fft-cache';

export type FreeDecay =
  | { found: true; dampingRatio: number; fromS: number; toS: number; cycles: number; nepers: number; rSquared: number }
  | { found: false; why: string };

/** The full complex spectrum of a real signal zero-padded to at least twice its length (so filtering does not wrap round). */
export interface PaddedSpectrum {
  /** Interleaved re, im of N bins. */
  bins: Float64Array;
  size: number;
  /** Samples of the signal. */
  n: number;
  rateHz: number;
}

export function paddedSpectrum(x: Float64Array, rateHz: number): PaddedSpectrum {
  const size = nextPowerOfTwo(2 * x.length);
  const input = new Float64Array(2 * size);
  for (let i = 0; i < x.length; i++) input[2 * i] = x[i];
  const bins = new Float64Array(2 * size);
  fftPlan(size).transform(bins, input);
  return { bins, size, n: x.length, rateHz };
}

/**
 * Envelope of the signal band-passed to [f0 − B, f0 + B] with raised-cosine flanks out to ±2B. Keeping only
 * positive frequencies (doubled) makes the result the analytic signal, whose magnitude is the envelope.
 */
export function bandEnvelope(s: PaddedSpectrum, f0: number, halfBandHz: number): Float64Array {
  const { size, rateHz } = s;
  const filtered = new Float64Array(2 * size);
  for (let k = 1; k < size / 2; k++) {
    const d = Math.abs((k * rateHz) / size - f0);
    const g = d <= halfBandHz ? 2 : d <= 2 * halfBandHz ? 1 + Math.cos((Math.PI * (d - halfBandHz)) / halfBandHz) : 0;
    filtered[2 * k] = g * s.bins[2 * k];
    filtered[2 * k + 1] = g * s.bins[2 * k + 1];
  }
  const z = new Float64Array(2 * size);
  fftPlan(size).inverseTransform(z, filtered);
  const env = new Float64Array(s.n);
  for (let i = 0; i < s.n; i++) env[i] = Math.hypot(z[2 * i], z[2 * i + 1]);
  return env;
}

/** Fewest cycles, and least fall (nepers, e-fold), over which a decay is fitted; least r² of the straight line. */
const MIN_CYCLES = 3;
const MIN_NEPERS = 1;
const MIN_R_SQUARED = 0.95;

/**
 * Fits the decay of an envelope after its largest value. The first and last 1/(2B) seconds are left out (the band-pass
 * filter's own rise time); the fit stops where the envelope falls to four times the envelope's median over the
 * last quarter of the record (the noise it ends in) or to 2 % of its peak, whichever is higher.
 */
export function fitFreeDecay(env: Float64Array, rateHz: number, f0: number, halfBandHz: number): FreeDecay {
  const n = env.length;
  const settle = Math.ceil((0.5 * rateHz) / halfBandHz);
  if (n <= 4 * settle) return { found: false, why: 'the record is too short for the band-pass filter to settle' };
  let iMax = settle;
  for (let i = settle; i < n - settle; i++) if (env[i] > env[iMax]) iMax = i;
  const tail = env.slice(Math.floor(n - settle - (n - 2 * settle) / 4), n - settle).sort();
  const noise = tail[Math.floor(tail.length / 2)];
  const threshold = Math.max(4 * noise, 0.02 * env[iMax]);
  const start = iMax + settle;
  let end = start;
  while (end < n - settle && env[end] > threshold) end++;
  const cycles = ((end - start) * f0) / rateHz;
  if (!(cycles >= MIN_CYCLES)) return { found: false, why: `no free decay: the envelope is back near the level it ends at within ${cycles.toFixed(1)} cycles of its largest value (at least ${MIN_CYCLES} needed)` };
  // Weighted least-squares line through (t, ln env). Noise of standard deviation s on an envelope E scatters ln E
  // by about s/E, so each point is weighted by E² (classical weighting by inverse variance).
  let sw = 0, st = 0, sy = 0, stt = 0, sty = 0, syy = 0;
  for (let i = start; i < end; i++) {
    const w = env[i] * env[i];
    const t = (i - start) / rateHz;
    const y = Math.log(env[i]);
    sw += w; st += w * t; sy += w * y; stt += w * t * t; sty += w * t * y; syy += w * y * y;
  }
  const vt = stt - (st * st) / sw;
  const vy = syy - (sy * sy) / sw;
  const cty = sty - (st * sy) / sw;
  const slope = cty / vt;
  const rSquared = vy > 0 ? (cty * cty) / (vt * vy) : 0;
  const nepers = (-slope * (end - start)) / rateHz;
  if (!(slope < 0) || nepers < MIN_NEPERS) return { found: false, why: `no free decay: the envelope falls by ${Math.max(0, nepers).toFixed(2)} nepers over the fit, less than ${MIN_NEPERS}` };
  if (rSquared < MIN_R_SQUARED) return { found: false, why: `no clean free decay: the logarithm of the envelope is not a straight line (r² = ${rSquared.toFixed(2)}, expected ≥ ${MIN_R_SQUARED})` };
  const sigma = -slope;
  const omegaD = 2 * Math.PI * f0;
  return { found: true, dampingRatio: sigma / Math.hypot(sigma, omegaD), fromS: start / rateHz, toS: end / rateHz, cycles, nepers, rSquared };
}
