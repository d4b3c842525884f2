import { logAxisFor, logTicks, toPx } from '../plots/log-axis';
import { formatSig } from '../format/numbers';
import type { ChartBand } from './chart-bands';

export interface ChartMode {
  index: number;
  dryHz?: number;
  wetHz: number;
}

interface Props {
  modes: readonly ChartMode[];
  bands: readonly ChartBand[];
  widthPx?: number;
  /** Row labels of the two mode rows; a member without liquid shows its dry frequencies in the solid row. */
  rowLabels?: { dry: string; wet: string };
}

const ROW_LABELS = { dry: 'dry (dashed)', wet: 'wet (solid)' };

/**
 * Natural frequencies (dry dashed, wet solid, labelled) against shaded excitation bands, on a log axis.
 * The text table beside it (in the Results screen) carries the same numbers for reading and printing.
 */
export function FrequencyChart({ modes, bands, widthPx = 640, rowLabels = ROW_LABELS }: Props) {
  const rowH = 22;
  const top = 10;
  const bandsH = Math.max(1, bands.length) * rowH;
  const modesTop = top + bandsH + 8;
  const height = modesTop + 56 + 24;
  const left = 150;
  const right = widthPx - 16;
  const all = [...modes.flatMap((m) => [m.wetHz, m.dryHz ?? m.wetHz]), ...bands.flatMap((b) => [b.lowHz, b.highHz])];
  const axis = logAxisFor(all, left, right);
  const ticks = logTicks(axis);
  return (
    <svg class="freq-chart" viewBox={`0 0 ${widthPx} ${height}`} role="img" aria-label="Natural frequencies against excitation bands, log scale; the table gives the same values">
      {ticks.map((t) => (
        <g key={t.hz} class={t.major ? 'tick major' : 'tick'}>
          <line x1={toPx(axis, t.hz)} x2={toPx(axis, t.hz)} y1={top} y2={height - 22} />
          {(t.major || ticks.length < 12) && <text x={toPx(axis, t.hz)} y={height - 6} text-anchor="middle">{formatSig(t.hz, 2)}</text>}
        </g>
      ))}
      <text x={left - 30} y={height - 6} text-anchor="end" class="axis-unit">frequency, Hz</text>
      {bands.map((b, i) => {
        const y = top + i * rowH;
        const x0 = toPx(axis, b.lowHz);
        const x1 = Math.max(toPx(axis, b.highHz), x0 + 3);
        return (
          <g key={b.label} class={`band band-${b.kind}`}>
            <text x={left - 6} y={y + 15} text-anchor="end">{b.label.length > 22 ? `${b.label.slice(0, 21)}…` : b.label}</text>
            <rect x={x0} y={y + 2} width={x1 - x0} height={rowH - 4} />
          </g>
        );
      })}
      <text x={left - 6} y={modesTop + 18} text-anchor="end">{rowLabels.dry}</text>
      <text x={left - 6} y={modesTop + 46} text-anchor="end">{rowLabels.wet}</text>
      {modes.map((m) => (
        <g key={m.index}>
          {m.dryHz !== undefined && (
            <g class="mode-line dry">
              <line x1={toPx(axis, m.dryHz)} x2={toPx(axis, m.dryHz)} y1={top} y2={modesTop + 26} />
              <text x={toPx(axis, m.dryHz) + 3} y={modesTop + 18}>{m.index}</text>
            </g>
          )}
          <g class="mode-line wet">
            <line x1={toPx(axis, m.wetHz)} x2={toPx(axis, m.wetHz)} y1={top} y2={modesTop + 54} />
            <text x={toPx(axis, m.wetHz) + 3} y={modesTop + 46}>{m.index}</text>
          </g>
        </g>
      ))}
    </svg>
  );
}
