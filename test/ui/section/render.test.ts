import { describe, expect, it, vi } from 'vitest';
import { h } from 'preact';

// Components are rendered by calling them (render-text.ts): state keeps its initial value, memos are
// computed, effects (the worker) never run.
vi.mock('preact/hooks', () => ({
  useState: <T,>(init: T | (() => T)) => [typeof init === 'function' ? (init as () => T)() : init, () => {}],
  useMemo: <T,>(f: () => T) => f(),
  useEffect: () => {},
  useRef: <T,>(init: T) => ({ current: init }),
}));

import { solveSection, type SectionInput } from '../../../src/physics/section';
import { CAUTION_LINE } from '../../../src/text/cautions';
import { createSectionMemo, solveSectionRequest } from '../../../src/app/solve-section';
import { BodyCard } from '../../../src/ui/section/BodyCard';
import { newBody, openWater } from '../../../src/ui/section/form';
import { mapView } from '../../../src/ui/section/map-grid';
import { mapDisplay } from '../../../src/ui/section/map-values';
import { MapLegend } from '../../../src/ui/section/MapLegend';
import { SectionNumbers } from '../../../src/ui/section/SectionNumbers';
import { SectionPlot } from '../../../src/ui/section/SectionPlot';
import { SectionScreen } from '../../../src/ui/section/SectionScreen';
import { SectionModel } from '../../../src/ui/section/section-model';
import { SurroundingsEditor } from '../../../src/ui/section/SurroundingsEditor';
import { renderToText, textOf } from '../results/render-text';

const mm = (m: number) => `${Math.round(m * 1000)} mm`;
const noop = () => {};

/** Every table has a caption, every header cell a scope, and no number failed to format. */
function expectWellFormed(html: string): void {
  expect(textOf(html)).not.toMatch(/NaN|undefined|\[object Object\]|Infinity/);
  expect((html.match(/<caption>/g) ?? []).length).toBe((html.match(/<table[^>]*>/g) ?? []).length);
  expect(html).not.toMatch(/<th(?=[\s>])(?![^>]*scope=)[^>]*>/);
}

describe('Section screen as first opened', () => {
  // A solver that never answers: the render shows the screen as first opened (effects do not run here anyway).
  const model = new SectionModel({ request: () => new Promise(() => {}), terminate: () => {} });
  const html = renderToText(h(SectionScreen, { model }));
  const text = textOf(html);

  it('offers the presets, the liquid, one body and the surroundings', () => {
    for (const p of ['Circle in open water', 'Square', 'Flat plate', 'Stem in a pipe (annulus)', 'Pile near the seabed', 'Two piles side by side', 'Half-immersed float']) {
      expect(text).toContain(p);
    }
    expect(html).toContain('<label for="sec-density">Density</label>');
    expect(text).toContain('Body 1');
    expect(text).toContain('Diameter');
    expect(text).toContain('Wall or seabed below');
    expect(text).toContain('Free surface above');
  });

  it('draws the circle to scale and shows sway as the selected motion', () => {
    expect(html).toMatch(/<svg class="section-plot" viewBox="0 0 600 600(\.0)?" role="img" aria-label="Section drawn to scale with 1 body">/);
    expect(html).toContain('<button type="button" class="btn" aria-pressed="true">Sway (x)</button>');
    expect(html).toContain('role="status" aria-live="polite"');
  });
});

describe('section editor pieces', () => {
  it('shows a rectangle’s sizes and puts a message beside its field', () => {
    const b = newBody('rectangle', { width: '' });
    const html = renderToText(
      h(BodyCard, { body: b, index: 1, errors: { [`body.${b.id}.width`]: 'enter a length such as 610 mm or 24 in' }, canRemove: true, onChange: noop, onRemove: noop }),
    );
    const text = textOf(html);
    expect(text).toContain('Body 2');
    for (const f of ['Width (across x)', 'Height (across y)', 'Corner radius', 'Centre x', 'Centre y', 'Angle (anticlockwise)', 'Remove body 2']) expect(text).toContain(f);
    expect(html).toContain(`aria-describedby="sec-${b.id}-width-error" aria-invalid`);
    expect(html).toContain(`<p class="field-error" id="sec-${b.id}-width-error">`);
  });

  it('asks a polygon for its points and a circle for no angle', () => {
    expect(textOf(renderToText(h(BodyCard, { body: newBody('polygon'), index: 0, errors: {}, canRemove: false, onChange: noop, onRemove: noop })))).toContain(
      'Corner points x y (mm, from the centre)',
    );
    const circle = textOf(renderToText(h(BodyCard, { body: newBody('circle'), index: 0, errors: {}, canRemove: false, onChange: noop, onRemove: noop })));
    expect(circle).not.toContain('Angle');
    expect(circle).not.toContain('Remove');
  });

  it('shows distance fields only for chosen surroundings, with the gap and the free-surface note', () => {
    const none = textOf(renderToText(h(SurroundingsEditor, { s: openWater(), errors: {}, clearances: {}, formatLength: mm, view: 'elevation', onView: noop, onChange: noop })));
    expect(none).not.toContain('Distance below the origin');
    const s = openWater({ wallBelow: true, freeSurface: true, enclosure: 'rectangle' });
    const text = textOf(
      renderToText(h(SurroundingsEditor, { s, errors: {}, clearances: { wallBelow: 0.45, freeSurface: -0.5 }, formatLength: mm, view: 'elevation', onView: noop, onChange: noop })),
    );
    expect(text).toContain('Distance below the origin');
    expect(text).toContain('Clear gap to the nearest body: 450 mm.');
    expect(text).toContain('A body reaches or crosses it: only the part on the liquid side is wetted.');
    expect(text).toContain('high-frequency limit (φ = 0, pressure release): valid well above the sloshing frequencies');
    expect(text).toContain('Inside width (x)');
  });

  it('in a plan view (a vertical member seen from above) names quay or tank walls and offers no free surface', () => {
    const plan = textOf(renderToText(h(SurroundingsEditor, { s: openWater({ wallBelow: true }), errors: {}, clearances: {}, formatLength: mm, view: 'plan', onView: noop, onChange: noop })));
    expect(plan).toContain('Quay wall or tank wall alongside');
    expect(plan).toContain('Quay wall or tank wall ahead');
    expect(plan).toContain('Plan view of a vertical member, seen from above');
    expect(plan).not.toContain('seabed');
    expect(plan).not.toContain('Free surface above');
    expect(plan).not.toContain('Pressure-release line');
    // A free surface already set stays offered, so it can be switched off.
    const kept = textOf(renderToText(h(SurroundingsEditor, { s: openWater({ freeSurface: true }), errors: {}, clearances: {}, formatLength: mm, view: 'plan', onView: noop, onChange: noop })));
    expect(kept).toContain('Pressure-release line');
  });
});

const pair: SectionInput = {
  liquidDensityKgPerM3: 1025,
  bodies: [{ shape: 'circle', diameterM: 0.9, centerM: [-0.9, 0] }, { shape: 'rectangle', widthM: 0.6, heightM: 0.3, centerM: [0.9, 0] }],
  boundaries: [{ kind: 'free-surface', pointM: [0, 0.6], normal: [0, -1] }],
};

describe('section results', () => {
  it('lists per-body numbers, the labelled 6 × 6 matrix, the energy check and the caution', () => {
    const o = solveSection(pair, { energyCheck: true });
    if (!o.ok) throw new Error(o.message);
    const html = renderToText(h(SectionNumbers, { input: pair, result: o.result, system: 'si', onSystem: noop, checking: false, stale: true, formatLength: mm }));
    expectWellFormed(html);
    const text = textOf(html);
    expect(text).toContain('Body 1: circle 900 mm');
    expect(text).toContain('Body 2: rectangle 600 mm × 300 mm');
    expect(text).toContain('Added-mass matrix, 6 × 6, per metre of length');
    expect(html).toContain('<th scope="col">body 2 θ</th>');
    expect(html).toContain('<th scope="row">body 1 x</th>');
    expect(text).toContain('Kinetic-energy cross-check of the diagonal terms');
    expect(text).toContain('Field integral ρ∫|∇φ|² dA');
    expect(text).toContain(CAUTION_LINE);
    expect(text).toContain('Out of date');
    expect(text).toMatch(/Ca = added mass \/ \(ρ π a²\)/);
  });

  it('draws the map, the bodies, the free surface and its legend', () => {
    const v = mapView(pair);
    const a = solveSectionRequest({ op: 'section', input: pair, energyCheck: false, map: { body: 1, motion: 'y', grid: v.grid } }, createSectionMemo());
    if (!a.ok || !a.field) throw new Error('expected a map');
    const display = mapDisplay(a.field, pair, 'speed', mm);
    const html = renderToText(
      h(SectionPlot, { input: pair, box: v.box, field: a.field, display, body: 1, motion: 'y', stale: false, label: 'Section to scale', formatLength: mm }),
    );
    expect(html.match(/<polygon class="sec-body/g)).toHaveLength(2);
    expect(html).toContain('<polygon class="sec-body selected"');
    expect(textOf(html)).toContain('free surface (φ = 0)');
    expect(html).toContain('marker-end="url(#sec-arrowhead)"');
    expect(textOf(html)).toMatch(/\d+ mm/);
    const legend = textOf(renderToText(h(MapLegend, { display, quantity: 'speed' })));
    expect(legend).toMatch(/^Liquid speed \/ body speed, \|∇φ\|\/U ≥ 3 2 to 3 .* 0 to 0\.1 U = the body speed\. Highest on the map: [\d.]+ × the body speed/);
  });
});
