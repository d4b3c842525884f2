import { useMemo, useState } from 'preact/hooks';
import type { SectionDof, SectionInput } from '../../physics/section';
import type { SectionField } from '../../app/solve-section';
import { legendNumber, mapPixels } from './colour-scale';
import type { Box } from './geometry';
import { nearestPoint, valueAt, type MapDisplay } from './map-values';
import { plotFrame } from './plot-frame';
import { PlotShapes } from './PlotShapes';

/** SVG units across the plot; the drawing scales to its box. */
const WIDTH = 600;

interface Props {
  input: SectionInput;
  box: Box;
  field: SectionField | null;
  display: MapDisplay | null;
  body: number | null;
  motion: SectionDof;
  stale: boolean;
  /** One-sentence description for screen readers. */
  label: string;
  formatLength: (m: number) => string;
  /** The axes in a few words (elevation "x to the right, y up", or a plan view's words). */
  axes?: string;
}

/** The map as a data URL of one pixel per cell (the browser scales it; pixelated, so cells stay cells). */
function useMapImage(field: SectionField | null, display: MapDisplay | null): string | null {
  return useMemo(() => {
    if (!field || !display || typeof document === 'undefined') return null;
    const { nx, ny } = field.grid;
    const canvas = document.createElement('canvas');
    canvas.width = nx;
    canvas.height = ny;
    const ctx = canvas.getContext('2d');
    if (!ctx) return null;
    const px = mapPixels(display.values, nx, ny, display.scale, display.factor);
    ctx.putImageData(new ImageData(px as Uint8ClampedArray<ArrayBuffer>, nx, ny), 0, 0);
    return canvas.toDataURL();
  }, [field, display]);
}

/** The section to scale with the flow map underneath; a tap reads the value at that point. */
export function SectionPlot({ input, box, field, display, body, motion, stale, label, formatLength, axes = 'x to the right, y up' }: Props) {
  const f = plotFrame(box, WIDTH);
  const image = useMapImage(field, display);
  const [picked, setPicked] = useState<{ x: number; y: number } | null>(null);
  // The value is read on every render, so it follows a change of motion or quantity.
  const pick = picked && field && display ? { ...picked, v: valueAt(field, display.values, display.factor, picked.x, picked.y) } : null;
  const g = field?.grid;
  const hx = g ? (g.x1 - g.x0) / (g.nx - 1) : 0;
  const hy = g ? (g.y1 - g.y0) / (g.ny - 1) : 0;
  const onClick = (e: MouseEvent) => {
    if (!field || !display) return;
    const svg = e.currentTarget as SVGSVGElement;
    const r = svg.getBoundingClientRect();
    // The viewBox keeps the aspect ratio, so one scale serves both axes.
    const k = Math.min(r.width / f.width, r.height / f.height);
    const ox = (r.width - f.width * k) / 2, oy = (r.height - f.height * k) / 2;
    const [x, y] = f.toSection((e.clientX - r.left - ox) / k, (e.clientY - r.top - oy) / k);
    // Read (and mark) the cell centre the value belongs to, not the tapped point.
    const p = nearestPoint(field, x, y);
    setPicked(p ? { x: p.x, y: p.y } : null);
  };
  return (
    <figure class={`section-figure${stale ? ' stale' : ''}`}>
      <svg
        class="section-plot"
        viewBox={`0 0 ${f.width} ${f.height.toFixed(1)}`}
        role="img"
        aria-label={label}
        onClick={onClick}
      >
        <rect class="sec-liquid" x="0" y="0" width={f.width} height={f.height} />
        {image && g && (
          <image
            href={image}
            x={f.X(g.x0 - hx / 2)}
            y={f.Y(g.y1 + hy / 2)}
            width={(g.x1 - g.x0 + hx) * f.s}
            height={(g.y1 - g.y0 + hy) * f.s}
            preserveAspectRatio="none"
            class="sec-map"
          />
        )}
        <PlotShapes input={input} box={box} f={f} body={field ? field.body : body} motion={field ? field.motion : motion} formatLength={formatLength} />
        {pick && Number.isFinite(pick.v) && <circle class="sec-pick" cx={f.X(pick.x)} cy={f.Y(pick.y)} r="5" />}
      </svg>
      <figcaption>
        {stale && <strong class="stale-note">Out of date: drawn for the section before your last change. </strong>}
        <span>Drawn to scale; {axes}; + marks each body's centre, the arrow its motion.</span>{' '}
        {display && (
          <span class="sec-readout" aria-live="polite">
            {pick
              ? Number.isFinite(pick.v)
                ? `At x ${formatLength(pick.x)}, y ${formatLength(pick.y)}: ${legendNumber(pick.v)}.`
                : 'No liquid at that point.'
              : 'Tap the map to read a value.'}
          </span>
        )}
      </figcaption>
    </figure>
  );
}
