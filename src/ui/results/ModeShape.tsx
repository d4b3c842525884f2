import { useState } from 'preact/hooks';
import type { MemberResult } from '../../physics/beam/result';
import type { MemberBuild } from '../../kinds/common/types';
import { formatHz } from '../format/numbers';
import { MemberPlot, type PlotShape } from '../plots/MemberPlot';
import type { DisplayUnits } from './display-units';
import { LevelsTable } from './LevelsTable';
import { plotLandmarks } from './landmark-rows';

interface FigureProps {
  build: MemberBuild;
  member: MemberResult;
  /** 0-based mode index. */
  modeIndex: number;
  units: DisplayUnits;
}

/** Dry and wet shapes of one mode; the wet shape is left out when there is no liquid. */
export function modeShapes(member: MemberResult, modeIndex: number): PlotShape[] {
  const n = modeIndex + 1;
  const shapes: PlotShape[] = [];
  const d = member.dry.modes[modeIndex];
  const w = member.wet?.modes[modeIndex];
  if (d) shapes.push({ label: `Mode ${n} dry`, kind: 'dry', zM: d.shape.zM, displacement: d.shape.displacement });
  if (w) shapes.push({ label: `Mode ${n} wet`, kind: 'wet', zM: w.shape.zM, displacement: w.shape.displacement });
  return shapes;
}

/** One mode drawn on the to-scale schematic, with the levels in the user's units beside it. */
export function ModeShapeFigure({ build, member, modeIndex, units }: FigureProps) {
  const n = modeIndex + 1;
  const d = member.dry.modes[modeIndex];
  const w = member.wet?.modes[modeIndex];
  const freqs = [d && `dry ${formatHz(d.frequencyHz)} (dashed)`, w && `wet ${formatHz(w.frequencyHz)} (solid)`].filter(Boolean).join(', ');
  return (
    <div class="mode-shape">
      <figure class="mode-figure">
        <MemberPlot
          model={build.model}
          landmarks={plotLandmarks(build.landmarks, build.model.lengthM)}
          shapes={modeShapes(member, modeIndex)}
          title={`Member schematic to scale with mode ${n}: ${freqs}`}
        />
        <figcaption>
          Mode {n}: {freqs}. Shapes scaled so the largest movement is the same; the schematic is to scale along the member.
        </figcaption>
      </figure>
      <LevelsTable build={build} units={units} />
    </div>
  );
}

/** The mode-shape section of the Results screen: a button per mode (aria-pressed) and the figure. */
export function ModeShapePanel({ build, member, units }: Omit<FigureProps, 'modeIndex'>) {
  const [selected, setSelected] = useState(0);
  const count = member.dry.modes.length;
  const modeIndex = Math.min(selected, Math.max(0, count - 1));
  return (
    <section class="results-block" aria-labelledby="shapes-title">
      <h2 id="shapes-title">Mode shapes</h2>
      <div class="mode-buttons" role="group" aria-label="Mode shown">
        {Array.from({ length: count }, (_, i) => (
          <button key={i} type="button" class="btn mode-button" aria-pressed={i === modeIndex} onClick={() => setSelected(i)}>
            Mode {i + 1}
          </button>
        ))}
      </div>
      <ModeShapeFigure build={build} member={member} modeIndex={modeIndex} units={units} />
    </section>
  );
}
