/**
 * One FFT plan per size, kept for reuse (planning builds twiddle and bit-reversal tables).
 * The transform itself is the `fft.js` package (radix-4, MIT): pure JavaScript, no DOM or Node APIs, so it runs in
 * the app, its worker and the command line alike.
 */
import FFT from 'fft.js';

const plans = new Map<number, FFT>();

/** The FFT plan for a power-of-two size (at least 4). */
export function fftPlan(size: number): FFT {
  let p = plans.get(size);
  if (!p) {
    p = new FFT(size);
    plans.set(size, p);
  }
  return p;
}

/** Smallest power of two ≥ n (n ≥ 1). */
export function nextPowerOfTwo(n: number): number {
  let p = 1;
  while (p < n) p *= 2;
  return p;
}

/** Largest power of two ≤ n (n ≥ 1). */
export function previousPowerOfTwo(n: number): number {
  let p = 1;
  while (p * 2 <= n) p *= 2;
  return p;
}
