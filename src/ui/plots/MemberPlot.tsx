import type { MemberModel } from '../../physics/beam/model';
import { landmarkLabels, segmentRects, shapePoints, zToY, type PlotBox } from './member-geometry';

export interface PlotShape {
  label: string;
  kind: 'dry' | 'wet';
  zM: readonly number[];
  displacement: readonly number[];
}

export interface Landmark {
  label: string;
  zM: number;
}

interface Props {
  model: MemberModel;
  landmarks?: readonly Landmark[];
  shapes?: readonly PlotShape[];
  /** Accessible title, e.g. "Pile schematic with mode 1". */
  title: string;
  widthPx?: number;
  heightPx?: number;
}

/**
 * To-scale schematic of a member (vertical scale true, width to the same scale with a visible minimum),
 * with the liquid, landmarks, supports and masses, and optionally mode shapes overlaid:
 * dry dashed, wet solid, each labelled, so colour is never the only cue.
 */
export function MemberPlot({ model, landmarks = [], shapes = [], title, widthPx = 300, heightPx = 440 }: Props) {
  const box: PlotBox = { widthPx, heightPx, padPx: 14 };
  const cx = widthPx * 0.58;
  const L = model.lengthM;
  const rects = segmentRects(model, box, cx);
  const liquid = model.liquid;
  const amplitude = widthPx * 0.3;
  return (
    <svg class="member-plot" viewBox={`0 0 ${widthPx} ${heightPx}`} role="img" aria-label={title}>
      <title>{title}</title>
      {liquid && (
        <rect
          class="plot-liquid"
          x={0}
          width={widthPx}
          y={zToY(liquid.toM, L, box)}
          height={zToY(liquid.fromM, L, box) - zToY(liquid.toM, L, box)}
        />
      )}
      {landmarkLabels(landmarks, L, box).map((m) => (
        <g key={m.label} class="plot-landmark">
          <line x1={0} x2={widthPx} y1={m.yLine} y2={m.yLine} />
          <text x={4} y={m.yText}>{m.label}</text>
        </g>
      ))}
      {rects.map((r, i) => (
        <g key={i}>
          {r.coatPx > 0 && <rect class="plot-coat" x={r.x - r.coatPx} y={r.y} width={r.width + 2 * r.coatPx} height={r.height} />}
          <rect class="plot-member" x={r.x} y={r.y} width={r.width} height={r.height} />
        </g>
      ))}
      {model.supports.map((s, i) => {
        const y = zToY(s.atM, L, box);
        const label = s.kind === 'spring' ? 'spring support' : `${s.kind} support`;
        return s.kind === 'clamped' ? (
          <rect key={i} class="plot-support" x={cx - 22} y={y - 3} width={44} height={6}><title>{label}</title></rect>
        ) : (
          <path key={i} class="plot-support" d={`M${cx - 16} ${y + 9} L${cx} ${y} L${cx + 16} ${y + 9} Z`}><title>{label}</title></path>
        );
      })}
      {(model.masses ?? []).map((m, i) => {
        const y = zToY(m.atM, L, box);
        return <rect key={i} class="plot-mass" x={cx - 9} y={y - 9} width={18} height={18}><title>{`mass ${m.massKg} kg`}</title></rect>;
      })}
      {shapes.map((s) => (
        <polyline key={s.label} class={`plot-shape plot-shape-${s.kind}`} points={shapePoints(s.zM, s.displacement, L, box, cx, amplitude)} />
      ))}
      {shapes.length > 0 && (
        // Bottom right: most modes move least near the root, so the legend stays clear of the shapes.
        <g class="plot-legend">
          {shapes.map((s, i) => (
            <g key={s.label} transform={`translate(${widthPx - 96} ${heightPx - 20 - (shapes.length - 1 - i) * 18})`}>
              <line class={`plot-shape plot-shape-${s.kind}`} x1={0} x2={22} y1={-4} y2={-4} />
              <text x={26} y={0}>{s.label}</text>
            </g>
          ))}
        </g>
      )}
    </svg>
  );
}
