/**
 * Wave band: forcing frequencies 1/T_max … 1/T_min (closed band), screened with the separation margin.
 */
import { sig } from './format';
import type { CheckResult } from './results';
import type { SourcedLimit, WaveBand } from './types';
import { classifyFrequency } from './verdict';

export function waveCheck(waves: WaveBand, frequencyHz: number, margin: SourcedLimit): CheckResult {
  const bandHz = { lowHz: 1 / waves.periodMaxS, highHz: 1 / waves.periodMinS };
  const { verdict, marginPercent } = classifyFrequency(frequencyHz, bandHz, margin.value);
  const label = waves.label ?? `waves ${sig(waves.periodMinS)}–${sig(waves.periodMaxS)} s`;
  const side = verdict === 'inside-band' ? 'inside' : frequencyHz > bandHz.highHz ? 'above' : 'below';
  return {
    kind: 'waves',
    label,
    frequencyBasis: 'wet',
    frequencyHz,
    verdict,
    marginPercent,
    bandHz,
    criticalSpeedMPerS: null,
    reason:
      `f_n = ${sig(frequencyHz)} Hz (period ${sig(1 / frequencyHz)} s) ${side} the wave band ` +
      `${sig(bandHz.lowHz)}–${sig(bandHz.highHz)} Hz; ±${sig(100 * margin.value)} % required`,
    source: `${margin.source}; wave band entered by user`,
  };
}
