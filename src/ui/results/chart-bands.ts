/**
 * Excitation bands for the frequency chart, gathered from the screening result: one band per excitation
 * label, the union over modes (a lock-in band differs a little from mode to mode because U and D are
 * taken where each mode moves most). Pure, so the chart and its text table show the same numbers.
 */
import type { ExcitationKind, ScreeningResult } from '../../physics/excitation/results';

export interface ChartBand {
  label: string;
  kind: ExcitationKind;
  lowHz: number;
  highHz: number;
}

export function chartBands(result: ScreeningResult): ChartBand[] {
  const byLabel = new Map<string, ChartBand>();
  for (const mode of result.modes) {
    for (const check of mode.checks) {
      const band = check.bandHz;
      if (!band || !(band.highHz > 0)) continue;
      const prev = byLabel.get(check.label);
      if (prev) {
        prev.lowHz = Math.min(prev.lowHz, band.lowHz);
        prev.highHz = Math.max(prev.highHz, band.highHz);
      } else {
        byLabel.set(check.label, { label: check.label, kind: check.kind, lowHz: band.lowHz, highHz: band.highHz });
      }
    }
  }
  return [...byLabel.values()].sort((a, b) => a.lowHz - b.lowHz);
}
