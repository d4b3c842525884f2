/**
 * Damping from the width of a spectral peak: where the power has fallen to half its peak value on either side,
 * ζ ≈ (f₂ − f₁) / (2 fₙ) (classical half-power bandwidth method, valid for light damping, ζ below about 0.1).
 *
 * A Hann-windowed spectrum widens every peak: a pure tone shows a half-power width of 1.44 bins (F. J. Harris, "On
 * the use of windows for harmonic analysis with the discrete Fourier transform", Proc. IEEE 66 (1978) 51-83,
 * Table 1, "3.0-dB BW"). The measured width is that of the true (Lorentzian) peak convolved with the window's
 * own; it is unfolded with the Voigt-width formula of J. J. Olivero and R. L. Longbothum, "Empirical fits to the
 * Voigt line width: a brief review", J. Quant. Spectrosc. Radiat. Transfer 17 (1977) 233-236, taking the window's
 * peak as the Gaussian part. Below three bins the width is mostly the window's and the damping is "not resolved".
 */

export type HalfPower =
  | { resolved: true; lowHz: number; highHz: number; widthBins: number; dampingRatio: number }
  | { resolved: false; lowHz: number | null; highHz: number | null; widthBins: number | null; why: string };

/** Half-power width of the Hann window's own peak, bins (Harris 1978, Table 1). */
export const HANN_HALF_POWER_BINS = 1.44;
/** Narrowest measured width, bins, from which a damping is reported. */
export const MIN_RESOLVED_BINS = 3;

/**
 * Finds the half-power frequencies of the peak at bin k (peak density `peakPsd`, frequency `peakHz`) by linear
 * interpolation between bins. Returns 'shoulder' when the spectrum climbs above this peak before falling to half
 * power on one side: the bin is a ripple on the flank of a stronger peak, not a peak of its own.
 */
export function halfPowerDamping(psd: Float64Array, k: number, peakPsd: number, peakHz: number, resolutionHz: number, firstBin: number): HalfPower | 'shoulder' {
  const lo = crossing(psd, k, -1, peakPsd, firstBin);
  const hi = crossing(psd, k, +1, peakPsd, firstBin);
  if (lo === 'higher' || hi === 'higher') return 'shoulder';
  const lowHz = lo === 'end' ? null : lo * resolutionHz;
  const highHz = hi === 'end' ? null : hi * resolutionHz;
  if (lo === 'end' || hi === 'end') {
    return { resolved: false, lowHz, highHz, widthBins: null, why: 'the peak does not fall to half power on both sides before the end of the searched spectrum' };
  }
  const widthBins = hi - lo;
  if (widthBins < MIN_RESOLVED_BINS) {
    return {
      resolved: false,
      lowHz,
      highHz,
      widthBins,
      why: `not resolved: the half-power width is ${widthBins.toFixed(2)} bins, mostly the window's own ${HANN_HALF_POWER_BINS} bins; a finer resolution (a longer record) would show it`,
    };
  }
  const trueBins = unfoldVoigt(widthBins, HANN_HALF_POWER_BINS);
  return { resolved: true, lowHz: lowHz as number, highHz: highHz as number, widthBins, dampingRatio: (trueBins * resolutionHz) / (2 * peakHz) };
}

/**
 * Fractional bin where the spectrum first falls to half of `peakPsd` walking from k in direction `dir` (linear
 * interpolation between bins). Ripples on the way down are stepped over (an averaged spectrum still scatters);
 * 'higher' when a bin above the peak comes first (k is a shoulder of a stronger peak), 'end' when the bins run out.
 */
function crossing(psd: Float64Array, k: number, dir: -1 | 1, peakPsd: number, firstBin: number): number | 'higher' | 'end' {
  const target = peakPsd / 2;
  let j = k;
  for (;;) {
    const next = j + dir;
    if (next < firstBin || next >= psd.length) return 'end';
    if (psd[next] > peakPsd) return 'higher';
    if (psd[next] <= target) return j + (dir * (psd[j] - target)) / (psd[j] - psd[next]);
    j = next;
  }
}

/**
 * Lorentzian width f_L from the measured (Voigt) width f_V and the Gaussian width f_G, inverting
 * f_V ≈ 0.5346 f_L + √(0.2166 f_L² + f_G²) (Olivero & Longbothum 1977): the smaller root of
 * 0.0692 f_L² − 1.0692 f_V f_L + (f_V² − f_G²) = 0.
 */
export function unfoldVoigt(fV: number, fG: number): number {
  const a = 0.5346 * 0.5346 - 0.2166;
  const b = -2 * 0.5346 * fV;
  const c = fV * fV - fG * fG;
  return (-b - Math.sqrt(b * b - 4 * a * c)) / (2 * a);
}
