/**
 * The averaged spectrum of a motion record as an SVG: log power against frequency, the peaks as dots (tap one to
 * pick it), and the predicted dry and wet frequencies drawn over it as vertical lines (with their bands, where
 * ranges are set), so the surveyor sees which peak is which mode.
 */
import type { SpectrumAnalysis } from '../../physics/signal';

export interface PredictedLine {
  frequencyHz: number;
  state: 'dry' | 'wet';
  mode: number;
  /** Lowest and highest over the ranges, Hz, where ranges are set. */
  band?: [number, number];
}

const W = 640;
const H = 260;
const PAD = { l: 48, r: 12, t: 22, b: 36 };

export function SpectrumPlot({ analysis, predicted, pickedHz, onPick }: { analysis: SpectrumAnalysis; predicted: PredictedLine[]; pickedHz: number | null; onPick: (peakIndex: number) => void }) {
  const psd = analysis.psd;
  const df = analysis.resolutionHz;
  // Show up to a little past the highest predicted line or peak, not always to half the sample rate: the modes of
  // interest are often low, and a 30 Hz axis would crowd them into the first few pixels.
  const marks = [...predicted.map((p) => p.band?.[1] ?? p.frequencyHz), ...analysis.peaks.slice(0, 5).map((p) => p.frequencyHz)];
  const fMax = Math.min(analysis.nyquistHz, marks.length > 0 ? 1.25 * Math.max(...marks) : analysis.nyquistHz);
  let lo = Infinity;
  let hi = -Infinity;
  const kMax = Math.min(psd.length - 1, Math.floor(fMax / df));
  for (let k = 1; k <= kMax; k++) {
    const v = Math.log10(Math.max(psd[k], 1e-300));
    if (Number.isFinite(v)) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
  }
  if (!(hi > lo)) hi = lo + 1;
  const x = (f: number) => PAD.l + ((W - PAD.l - PAD.r) * f) / fMax;
  const y = (logP: number) => PAD.t + ((H - PAD.t - PAD.b) * (hi - logP)) / (hi - lo);
  let d = '';
  for (let k = 1; k <= kMax; k++) d += `${k === 1 ? 'M' : 'L'}${x(k * df).toFixed(1)},${y(Math.log10(Math.max(psd[k], 1e-300))).toFixed(1)}`;
  const ticks = Array.from({ length: 6 }, (_, i) => (fMax * i) / 5);
  return (
    <svg class="spectrum-plot" viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Spectrum of the record: power against frequency, with the predicted frequencies" data-testid="spectrum-plot">
      {predicted.map((p) =>
        p.band ? <rect key={`b${p.state}${p.mode}`} class={`spectrum-band spectrum-${p.state}`} x={x(p.band[0])} y={PAD.t} width={Math.max(1, x(p.band[1]) - x(p.band[0]))} height={H - PAD.t - PAD.b} /> : null,
      )}
      <line class="spectrum-axis" x1={PAD.l} y1={H - PAD.b} x2={W - PAD.r} y2={H - PAD.b} />
      <line class="spectrum-axis" x1={PAD.l} y1={PAD.t} x2={PAD.l} y2={H - PAD.b} />
      {ticks.map((f) => (
        <text key={f} class="spectrum-tick" x={x(f)} y={H - PAD.b + 14} text-anchor="middle">
          {Number(f.toPrecision(3))}
        </text>
      ))}
      <text class="spectrum-tick" x={(PAD.l + W - PAD.r) / 2} y={H - 4} text-anchor="middle">
        Frequency, Hz
      </text>
      <text class="spectrum-tick" x={12} y={(PAD.t + H - PAD.b) / 2} text-anchor="middle" transform={`rotate(-90 12 ${(PAD.t + H - PAD.b) / 2})`}>
        log power
      </text>
      <path class="spectrum-line" d={d} fill="none" />
      {predicted
        .filter((p) => p.frequencyHz <= fMax)
        .map((p) => (
          <g key={`${p.state}${p.mode}`} data-testid={`predicted-${p.state}-${p.mode}`}>
            <line class={`spectrum-predicted spectrum-${p.state}`} x1={x(p.frequencyHz)} x2={x(p.frequencyHz)} y1={PAD.t} y2={H - PAD.b} />
            <text class="spectrum-tick" x={x(p.frequencyHz) + 3} y={PAD.t + 10 + (p.state === 'wet' ? 12 : 0)}>
              {p.state} {p.mode}
            </text>
          </g>
        ))}
      {analysis.peaks.map((pk, i) => {
        if (pk.frequencyHz > fMax) return null;
        const picked = pickedHz !== null && Math.abs(pk.frequencyHz - pickedHz) < 1e-9;
        return (
          <circle
            key={i}
            class={picked ? 'spectrum-peak spectrum-picked' : 'spectrum-peak'}
            cx={x(pk.frequencyHz)}
            cy={y(Math.log10(Math.max(psd[Math.min(psd.length - 1, Math.round(pk.frequencyHz / df))], 1e-300)))}
            r={picked ? 8 : 6}
            tabIndex={0}
            role="button"
            aria-label={`Peak at ${pk.frequencyHz.toFixed(3)} Hz${picked ? ', picked' : ''}`}
            onClick={() => onPick(i)}
            onKeyDown={(e) => (e.key === 'Enter' || e.key === ' ') && onPick(i)}
          />
        );
      })}
    </svg>
  );
}
