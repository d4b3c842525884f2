import type { SectionDof, SectionInput } from '../../physics/section';
import { bodyOutline, bodyReference, boxOf, dryPart, enclosureOf, enclosureOutline, farthestRadius, lineInBox, straightBoundaries, type Box } from './geometry';
import { scaleBarLength, svgPath, svgPoints, type PlotFrame } from './plot-frame';

interface Props {
  input: SectionInput;
  box: Box;
  f: PlotFrame;
  /** Body and motion shown by an arrow (null: none). */
  body: number | null;
  motion: SectionDof;
  formatLength: (m: number) => string;
}

/** The direction of the mapped motion, drawn from the body's reference point. */
function MotionArrow({ input, f, body, motion }: { input: SectionInput; f: PlotFrame; body: number; motion: SectionDof }) {
  const b = input.bodies[body];
  if (!b) return null;
  const [rx, ry] = bodyReference(b);
  const r = farthestRadius(b);
  const L = Math.max(0.6 * r * f.s, 18);
  const x = f.X(rx), y = f.Y(ry);
  if (motion === 'rotation') {
    const a = Math.max(0.45 * r * f.s, 12);
    const p = (deg: number) => `${(x + a * Math.cos((deg * Math.PI) / 180)).toFixed(1)},${(y - a * Math.sin((deg * Math.PI) / 180)).toFixed(1)}`;
    return <path class="sec-arrow" d={`M${p(-50)}A${a.toFixed(1)},${a.toFixed(1)} 0 0 0 ${p(50)}`} marker-end="url(#sec-arrowhead)" />;
  }
  const [x2, y2] = motion === 'x' ? [x + L, y] : [x, y - L];
  return <line class="sec-arrow" x1={x} y1={y} x2={x2} y2={y2} marker-end="url(#sec-arrowhead)" />;
}

/** Bodies, walls (hatched), free surface (dashed, labelled), enclosure and a scale bar, to scale. */
export function PlotShapes({ input, box, f, body, motion, formatLength }: Props) {
  const enclosure = enclosureOf(input);
  const lines = straightBoundaries(input);
  const bar = scaleBarLength(box[2] - box[0]);
  const many = input.bodies.length > 1;
  return (
    <g>
      <defs>
        <pattern id="sec-hatch" patternUnits="userSpaceOnUse" width="9" height="9" patternTransform="rotate(45)">
          <rect x="0" y="0" width="9" height="9" class="sec-hatch-bg" />
          <line x1="0" y1="0" x2="0" y2="9" class="sec-hatch-line" />
        </pattern>
        <marker id="sec-arrowhead" viewBox="0 0 10 10" refX="8" refY="5" markerWidth="7" markerHeight="7" orient="auto-start-reverse">
          <path d="M0,0L10,5L0,10Z" class="sec-arrowhead" />
        </marker>
      </defs>
      {enclosure && (
        <>
          <path
            class="sec-solid"
            fill-rule="evenodd"
            d={`M0,0H${f.width}V${f.height}H0Z ${svgPath(f, enclosureOutline(enclosure))}`}
          />
          <path class="sec-enclosure" d={svgPath(f, enclosureOutline(enclosure))} />
        </>
      )}
      {lines.map((l, i) => {
        const seg = lineInBox(l, box);
        if (!seg) return null;
        const dry = dryPart(l, box);
        const wall = l.kind === 'wall';
        return (
          <g key={i}>
            {dry.length >= 6 && <polygon class={wall ? 'sec-solid' : 'sec-air'} points={svgPoints(f, dry)} />}
            <line class={wall ? 'sec-wall' : 'sec-surface'} x1={f.X(seg[0])} y1={f.Y(seg[1])} x2={f.X(seg[2])} y2={f.Y(seg[3])} />
            <text class="sec-label" x={Math.min(f.X(seg[0]), f.X(seg[2])) + 6} y={Math.min(f.Y(seg[1]), f.Y(seg[3])) - 6}>
              {wall ? 'wall' : 'free surface (φ = 0)'}
            </text>
          </g>
        );
      })}
      {input.bodies.map((b, i) => {
        const out = bodyOutline(b, 128);
        const [rx, ry] = bodyReference(b);
        const bb = boxOf(out);
        const big = (bb[2] - bb[0]) * f.s > 28 && (bb[3] - bb[1]) * f.s > 20;
        return (
          <g key={i}>
            <polygon class={`sec-body${i === body ? ' selected' : ''}`} points={svgPoints(f, out)} />
            <path class="sec-ref" d={`M${f.X(rx) - 5},${f.Y(ry)}h10M${f.X(rx)},${f.Y(ry) - 5}v10`} />
            {many && (
              <text class="sec-body-label" x={big ? f.X(rx) + 6 : f.X(bb[2]) + 4} y={big ? f.Y(ry) - 6 : f.Y(bb[3])}>
                {i + 1}
              </text>
            )}
          </g>
        );
      })}
      {body !== null && <MotionArrow input={input} f={f} body={body} motion={motion} />}
      <g class="sec-scalebar" transform={`translate(12 ${(f.height - 14).toFixed(1)})`}>
        <rect x="-6" y="-22" width={bar * f.s + 12 + 8 * formatLength(bar).length} height="30" rx="4" class="sec-scalebar-bg" />
        <path d={`M0,-6V0H${(bar * f.s).toFixed(1)}V-6`} />
        <text x={bar * f.s + 6} y="0">{formatLength(bar)}</text>
      </g>
    </g>
  );
}
