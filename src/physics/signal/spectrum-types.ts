/** Inputs and outputs of `analyseMotionRecord` (frequencies in Hz; spectral densities in (input units)² per Hz). */

export interface SpectrumOptions {
  /** Wanted bin spacing, Hz; by default the record is cut into at least seven half-overlapping segments. */
  resolutionHz?: number;
  /** A peak must stand this far above the local median floor, dB (default 10). */
  minQualityDb?: number;
  /** At most this many peaks, strongest first (default 8). */
  maxPeaks?: number;
}

export interface PeakReport {
  /** Interpolated peak frequency, Hz. */
  frequencyHz: number;
  /** Best damping estimate: the free-decay fit when the record holds one, else the half-power width; null when neither. */
  dampingRatio: number | null;
  dampingMethod: 'free-decay' | 'half-power' | null;
  /** Peak over the local median floor, dB. */
  qualityDb: number;
  /** Peak spectral density, and the floor around it. */
  psd: number;
  floorPsd: number;
  /** The axis on which the peak is strongest. */
  strongestAxis: string;
  halfPower: { dampingRatio: number | null; lowHz: number | null; highHz: number | null; note: string | null };
  freeDecay: { dampingRatio: number | null; fromS: number | null; toS: number | null; cycles: number | null; rSquared: number | null; note: string | null };
}

export interface SpectrumAnalysis {
  ok: true;
  /** Rate of the even grid the record was put on (1 / median interval), Hz. */
  sampleRateHz: number;
  /** Samples per second actually achieved, (n − 1) / duration, Hz. */
  meanRateHz: number;
  /** Scatter of the sample intervals over their mean (0 for a regular logger). */
  intervalJitter: number;
  durationS: number;
  /** Bin spacing of the spectrum, Hz. */
  resolutionHz: number;
  /** Half the sample rate: the highest frequency the record can show, Hz. */
  nyquistHz: number;
  /** Lowest frequency searched for peaks, Hz. */
  lowestFrequencyHz: number;
  segmentLength: number;
  segments: number;
  /** Sum of the axes' spectra at k·resolutionHz, k = 0 .. segmentLength/2. */
  psd: Float64Array;
  /** Each axis's spectrum, same bins. */
  axisPsd: Float64Array[];
  axisNames: string[];
  /** Strongest first. */
  peaks: PeakReport[];
  /** Plain-words notes to show with the result (Nyquist limit, resampling, gaps, resolution). */
  notes: string[];
}
