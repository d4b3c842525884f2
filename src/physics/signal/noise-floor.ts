/**
 * The noise floor of a spectrum near a bin: the median of the spectral values in a window around it. A median
 * ignores the few bins a peak occupies (so a peak does not lift its own floor) and follows a floor that slopes,
 * such as the rising low-frequency motion of a hand-held tablet (common practice, no source).
 * The window is ±50 % of the bin's frequency (wide enough that a resonance peak a few per cent wide does not fill
 * it), at least ±8 bins and at most ±1024 bins.
 */
export function medianFloorAt(psd: Float64Array, k: number, firstBin: number): number {
  const reach = Math.min(1024, Math.max(8, Math.round(0.5 * k)));
  const lo = Math.max(firstBin, k - reach);
  const hi = Math.min(psd.length - 1, k + reach);
  const window = psd.slice(lo, hi + 1).sort();
  const m = window.length;
  return m % 2 === 1 ? window[(m - 1) / 2] : 0.5 * (window[m / 2 - 1] + window[m / 2]);
}
