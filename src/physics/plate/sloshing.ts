/**
 * Lowest sloshing frequencies of liquid of depth h in a rectangular tank, linear theory:
 *   f_n = (1/2π) √(g k_n tanh(k_n h)),  k_n = nπ/L
 * (classical; H.N. Abramson (ed.), The Dynamic Behavior of Liquids in Moving Containers, NASA SP-106, 1966).
 * Listed as excitations: near them the free surface is no longer a pressure-release surface and the wet
 * frequencies computed with φ = 0 there do not hold.
 */
import type { SloshingMode } from './types';

/** Standard gravity (m/s²). */
export const STANDARD_GRAVITY = 9.80665;

export function sloshingFrequencyHz(lengthM: number, depthM: number, n: number): number {
  const k = (n * Math.PI) / lengthM;
  return Math.sqrt(STANDARD_GRAVITY * k * Math.tanh(k * depthM)) / (2 * Math.PI);
}

/**
 * The first `count` modes along each free-surface dimension given, ascending: `spans` are (length, what)
 * pairs in metres, e.g. a compartment's length between plate and end wall and the tank's width.
 */
export function sloshingModes(spans: { lengthM: number; what: string }[], depthM: number, count: number): SloshingMode[] {
  const out: SloshingMode[] = [];
  for (const s of spans) {
    for (let n = 1; n <= count; n++) {
      out.push({ frequencyHz: sloshingFrequencyHz(s.lengthM, depthM, n), description: `${s.what}, mode ${n} (length ${s.lengthM} m, depth ${depthM} m)` });
    }
  }
  return out.sort((p, q) => p.frequencyHz - q.frequencyHz).slice(0, Math.max(count, 3));
}
