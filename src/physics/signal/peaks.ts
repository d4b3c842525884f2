/**
 * Peaks of a power spectrum: bins that are the largest within ±2 bins (the half-width of the Hann window's main
 * lobe, so one tone gives one peak) and stand at least `minQualityDb` above the local median floor; frequency
 * refined by a parabola through the logarithm of the three top bins (for a Hann window this places a tone within
 * a few hundredths of a bin; common practice, no source). A bin that is only a ripple on the flank of a stronger
 * peak (the spectrum climbs above it before falling to half power) is not a peak. Strongest first.
 */
import { halfPowerDamping, type HalfPower } from './half-power';
import { medianFloorAt } from './noise-floor';

export interface SpectrumPeak {
  /** Interpolated peak frequency, Hz. */
  frequencyHz: number;
  /** The bin of the local maximum. */
  bin: number;
  /** Interpolated peak density, (input units)²/Hz. */
  psd: number;
  /** Median floor around the peak, same units. */
  floorPsd: number;
  /** Peak over floor, dB: 10 log₁₀(psd / floorPsd). */
  qualityDb: number;
  halfPower: HalfPower;
}

export interface PeakOptions {
  /** Lowest bin searched (bins below carry the remains of gravity and drift). */
  firstBin: number;
  /** Peaks must stand this far above the floor, dB. */
  minQualityDb: number;
  /** At most this many peaks, strongest first. */
  maxPeaks: number;
}

export function findSpectrumPeaks(psd: Float64Array, resolutionHz: number, o: PeakOptions): SpectrumPeak[] {
  const last = psd.length - 2; // the Nyquist bin has no right neighbour
  const found: SpectrumPeak[] = [];
  for (let k = Math.max(o.firstBin, 1); k <= last; k++) {
    if (!isLocalMax(psd, k)) continue;
    const a = Math.log(Math.max(psd[k - 1], Number.MIN_VALUE));
    const b = Math.log(Math.max(psd[k], Number.MIN_VALUE));
    const c = Math.log(Math.max(psd[k + 1], Number.MIN_VALUE));
    const curve = a - 2 * b + c;
    const delta = curve < 0 ? Math.max(-0.5, Math.min(0.5, (0.5 * (a - c)) / curve)) : 0;
    const peakPsd = Math.exp(b - 0.25 * (a - c) * delta);
    const floorPsd = medianFloorAt(psd, k, o.firstBin);
    const qualityDb = 10 * Math.log10(peakPsd / floorPsd);
    if (!(qualityDb >= o.minQualityDb)) continue;
    const topHz = (k + delta) * resolutionHz;
    const halfPower = halfPowerDamping(psd, k, peakPsd, topHz, resolutionHz, o.firstBin);
    if (halfPower === 'shoulder') continue;
    // A peak several bins wide is located by the middle of its half-power band, which the scatter of the averaged
    // spectrum disturbs less than its top (for a symmetric resonance peak the two coincide).
    const frequencyHz = halfPower.resolved ? 0.5 * (halfPower.lowHz + halfPower.highHz) : topHz;
    found.push({ frequencyHz, bin: k, psd: peakPsd, floorPsd, qualityDb, halfPower });
  }
  return found.sort((p, q) => q.psd - p.psd).slice(0, o.maxPeaks);
}

/** Largest within ±2 bins; ties go to the lower bin so a flat top gives one peak. */
function isLocalMax(psd: Float64Array, k: number): boolean {
  const v = psd[k];
  for (let j = k - 2; j <= k + 2; j++) {
    if (j === k || j < 0 || j >= psd.length) continue;
    if (psd[j] > v || (j < k && psd[j] === v)) return false;
  }
  return v > 0;
}
