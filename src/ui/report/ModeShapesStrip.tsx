import type { MemberResult } from '../../physics/beam/result';
import { formatHz } from '../format/numbers';

const W = 64; // px per mode panel
const H = 150;
const PAD = 6;

/** Polyline points of a shape: displacement across (±1 → ±(W/2 − PAD)), z up the panel. */
function points(zM: readonly number[], w: readonly number[], lengthM: number): string {
  const half = W / 2 - PAD;
  return zM.map((z, i) => `${(W / 2 + w[i] * half).toFixed(1)},${(H - PAD - (z / lengthM) * (H - 2 * PAD)).toFixed(1)}`).join(' ');
}

/**
 * Every mode's shape, small and side by side, for the printed record: dry dashed, wet solid, the member's
 * axis as a thin line. The to-scale schematic with levels is on the Results screen.
 */
export function ModeShapesStrip({ member, lengthM }: { member: MemberResult; lengthM: number }) {
  const n = member.dry.modes.length;
  return (
    <figure class="mode-strip">
      <svg viewBox={`0 0 ${W * n} ${H + 28}`} role="img" aria-label={`Shapes of modes 1 to ${n}, dry dashed and wet solid`}>
        {member.dry.modes.map((d, i) => {
          const w = member.wet?.modes[i];
          return (
            <g key={i} transform={`translate(${i * W},0)`}>
              <line x1={W / 2} x2={W / 2} y1={PAD} y2={H - PAD} class="mode-strip-axis" />
              <polyline points={points(d.shape.zM, d.shape.displacement, lengthM)} class="mode-strip-dry" />
              {w && <polyline points={points(w.shape.zM, w.shape.displacement, lengthM)} class="mode-strip-wet" />}
              <text x={W / 2} y={H + 10} text-anchor="middle" class="mode-strip-label">Mode {i + 1}</text>
              <text x={W / 2} y={H + 22} text-anchor="middle" class="mode-strip-freq">{formatHz((w ?? d).frequencyHz)}</text>
            </g>
          );
        })}
      </svg>
      <figcaption>Mode shapes: dry dashed, wet solid (frequency shown: {member.wet ? 'wet' : 'dry'}); bottom of each panel is z = 0, top the member's far end.</figcaption>
    </figure>
  );
}
