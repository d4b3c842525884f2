import { formatSig } from '../format/numbers';
import type { SensitivityRow } from './band-rows';

interface Props {
  rows: readonly SensitivityRow[];
  /** 'wet' or 'dry': which lowest frequency the bars show. */
  basis: 'wet' | 'dry';
  widthPx?: number;
}

/** Tick values on a linear axis: 1, 2 or 5 times a power of ten, about five of them. */
function ticks(lo: number, hi: number): number[] {
  const span = hi - lo || Math.abs(hi) || 1;
  const raw = span / 5;
  const p = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * p).find((s) => s >= raw) ?? 10 * p;
  const out: number[] = [];
  for (let t = Math.ceil(lo / step) * step; t <= hi + 1e-9 * span; t += step) out.push(Number(t.toPrecision(12)));
  return out;
}

/**
 * What drives the band: one bar per ranged input from the lowest frequency at one end of its range to the
 * other (the others at their likely values), largest swing first, with the likely frequency as a line across.
 * The low end is marked with a hollow square, the high end with a filled one, so it reads without colour.
 * The table beside it carries the same numbers.
 */
export function SensitivityChart({ rows, basis, widthPx = 640 }: Props) {
  const rowH = 30;
  const top = 8;
  const left = 200;
  const right = widthPx - 20;
  const height = top + rows.length * rowH + 40;
  const all = rows.flatMap((r) => [r.atLowHz, r.atHighHz, r.likelyHz]);
  let lo = Math.min(...all);
  let hi = Math.max(...all);
  const pad = 0.06 * (hi - lo || hi || 1);
  lo -= pad;
  hi += pad;
  const x = (hz: number) => left + ((hz - lo) / (hi - lo)) * (right - left);
  const likely = rows[0]?.likelyHz;
  return (
    <svg class="sens-chart" viewBox={`0 0 ${widthPx} ${height}`} role="img" aria-label={`Lowest ${basis} frequency at the low and high end of each range, the others at their likely values; the table gives the same values`}>
      {ticks(lo, hi).map((t) => (
        <g key={t} class="tick">
          <line x1={x(t)} x2={x(t)} y1={top} y2={height - 28} />
          <text x={x(t)} y={height - 12} text-anchor="middle">{formatSig(t, 3)}</text>
        </g>
      ))}
      <text x={right} y={height - 0} text-anchor="end" class="axis-label">Hz</text>
      {likely !== undefined && <line class="sens-likely" x1={x(likely)} x2={x(likely)} y1={top - 2} y2={height - 28} />}
      {rows.map((r, i) => {
        const y = top + i * rowH + rowH / 2;
        const a = x(Math.min(r.atLowHz, r.atHighHz));
        const b = x(Math.max(r.atLowHz, r.atHighHz));
        return (
          <g key={r.key} class="sens-row" data-key={r.key}>
            <text x={left - 8} y={y + 5} text-anchor="end" class="sens-label">{r.label.length > 28 ? `${r.label.slice(0, 27)}…` : r.label}</text>
            <rect x={a} y={y - 8} width={Math.max(2, b - a)} height={16} class="sens-bar" />
            <rect x={x(r.atLowHz) - 5} y={y - 5} width={10} height={10} class="sens-end-low" />
            <rect x={x(r.atHighHz) - 5} y={y - 5} width={10} height={10} class="sens-end-high" />
          </g>
        );
      })}
    </svg>
  );
}
