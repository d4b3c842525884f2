/**
 * Synthetic motion records of known content, for the signal tests and the benchmark. Every mode is a free decay
 * x(t) = A e^(−ζωₙ(t−t₀)) sin(ω_d(t−t₀) + φ), ω_d = ωₙ√(1−ζ²), from its start time on (classical single-degree-of-
 * freedom free response), so its frequency and damping are known exactly. Noise is seeded Gaussian white noise.
 */
import { seededUniform01 } from '../../../src/physics/linalg/seeded';
import type { MotionRecord } from '../../../src/physics/signal';

export interface DecayingMode {
  /** Undamped natural frequency, Hz. */
  frequencyHz: number;
  dampingRatio: number;
  amplitude: number;
  phase?: number;
  startS?: number;
}

/** Gaussian deviates by the Box–Muller transform (classical) from a seeded uniform generator. */
export function seededGaussian(seed: number): () => number {
  const u = seededUniform01(seed);
  return () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());
}

/** Damped frequency f_d = fₙ√(1 − ζ²), Hz: where the spectral peak of a free decay sits. */
export function dampedHz(m: DecayingMode): number {
  return m.frequencyHz * Math.sqrt(1 - m.dampingRatio ** 2);
}

/** The sum of the modes at time t (s). */
export function decayValue(modes: readonly DecayingMode[], t: number): number {
  let v = 0;
  for (const m of modes) {
    const s = t - (m.startS ?? 0);
    if (s < 0) continue;
    const wn = 2 * Math.PI * m.frequencyHz;
    v += m.amplitude * Math.exp(-m.dampingRatio * wn * s) * Math.sin(wn * Math.sqrt(1 - m.dampingRatio ** 2) * s + (m.phase ?? 0));
  }
  return v;
}

/** Times of a regular logger: n samples at rateHz from 0. */
export function regularTimes(rateHz: number, durationS: number): Float64Array {
  const n = Math.floor(durationS * rateHz) + 1;
  return Float64Array.from({ length: n }, (_, i) => i / rateHz);
}

/**
 * Times of a tablet-like stream near rateHz: each interval is the nominal one ±25 % (uniform), and about one event
 * in fifty comes late by a whole interval (a dropped event), as browsers deliver motion events.
 */
export function jitteredTimes(rateHz: number, durationS: number, seed: number): Float64Array {
  const u = seededUniform01(seed);
  const out: number[] = [];
  let t = 0;
  while (t <= durationS) {
    out.push(t);
    t += (1 + 0.5 * (u() - 0.5) + (u() < 0.02 ? 1 : 0)) / rateHz;
  }
  return Float64Array.from(out);
}

/**
 * A record with one set of modes per axis, a constant offset per axis (gravity), and noise of the given
 * standard deviation on every axis.
 */
export function syntheticRecord(timeS: Float64Array, perAxis: readonly (readonly DecayingMode[])[], noiseRms: number, seed: number, gravity: readonly number[] = []): MotionRecord {
  const g = seededGaussian(seed);
  const axes = perAxis.map((modes, a) => Float64Array.from(timeS, (t) => decayValue(modes, t) + (gravity[a] ?? 0) + noiseRms * g()));
  return { timeS, axes, axisNames: axes.map((_, a) => ['x', 'y', 'z'][a]) };
}

/**
 * Stationary response of a single-degree-of-freedom oscillator to white noise, sampled at rateHz: the recursion
 * y_k = 2e^(−σΔ)cos(ω_dΔ) y_(k−1) − e^(−2σΔ) y_(k−2) + e_k has poles e^((−σ ± iω_d)Δ), exactly those of the
 * oscillator (impulse invariance, classical), so its damping ratio is σ/ωₙ exactly.
 */
export function randomResponse(rateHz: number, durationS: number, frequencyHz: number, dampingRatio: number, seed: number): Float64Array {
  const g = seededGaussian(seed);
  const dt = 1 / rateHz;
  const wn = 2 * Math.PI * frequencyHz;
  const sigma = dampingRatio * wn;
  const wd = wn * Math.sqrt(1 - dampingRatio ** 2);
  const a1 = 2 * Math.exp(-sigma * dt) * Math.cos(wd * dt);
  const a2 = -Math.exp(-2 * sigma * dt);
  const n = Math.floor(durationS * rateHz) + 1;
  const warm = Math.ceil(10 / (sigma * dt)); // ten time constants to forget the zero start
  const y = new Float64Array(n);
  let y1 = 0;
  let y2 = 0;
  for (let k = -warm; k < n; k++) {
    const v = a1 * y1 + a2 * y2 + g();
    y2 = y1;
    y1 = v;
    if (k >= 0) y[k] = v;
  }
  return y;
}
