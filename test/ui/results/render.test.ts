import { describe, expect, it, vi } from 'vitest';
import { h } from 'preact';

// The components are rendered by calling them (render-text.ts); useState just returns its initial value.
vi.mock('preact/hooks', () => ({
  useState: <T,>(init: T | (() => T)) => [typeof init === 'function' ? (init as () => T)() : init, () => {}],
  // Effects (the report's print header) do not run when rendering to text.
  useEffect: () => {},
  useRef: <T,>(init: T) => ({ current: init }),
}));


import { readCase, requestOf } from '../../../src/app/read-case';
import { createCase } from '../../../src/case';
import type { Case } from '../../../src/case';
import { CAUTIONS } from '../../../src/text/cautions';
import { contentKey, type Results } from '../../../src/ui/state/app-model';
import { ResultsView } from '../../../src/ui/results/ResultsView';
import { ReportView } from '../../../src/ui/report/ReportView';
import { solveCase } from '../../../src/app/solve-case';
import { renderToText, textOf } from './render-text';
import { DEMO_CASES } from '../../../src/kinds/registry';

function demo(kind: Case['kind']): { doc: Case; results: Results } {
  const d = DEMO_CASES.find((c) => c.kind === kind)!;
  const doc = createCase({
    id: '00000000-0000-4000-8000-000000000001',
    nowIso: '2026-03-14T09:21:05.123Z',
    appVersion: '0.1.0',
    kind,
    unitSystem: d.system,
    name: d.name,
    tag: d.tag,
    note: d.note,
    inputs: d.values,
    excitation: d.excitation ?? {},
  });
  const r = readCase(doc);
  if (!r.ok) throw new Error(`demo ${kind} does not read: ${JSON.stringify(r.errors)}`);
  const answer = solveCase(requestOf(r));
  return { doc, results: { answer, build: r.build, forKey: contentKey(doc) } };
}

/** Structural checks every rendering must pass: captions, header scopes, no NaN or undefined shown. */
function expectWellFormed(html: string): void {
  const text = textOf(html);
  expect(text).not.toMatch(/NaN|undefined|\[object Object\]|Infinity/);
  const tables = html.match(/<table[^>]*>/g) ?? [];
  const captions = html.match(/<caption>/g) ?? [];
  expect(captions.length).toBe(tables.length);
  expect(html).not.toMatch(/<th(?=[\s>])(?![^>]*scope=)[^>]*>/);
  for (const c of CAUTIONS) expect(text).toContain(c.title);
}

describe('Results screen renders every demo case', () => {
  for (const kind of ['pile', 'riser', 'baffle', 'stem'] as const) {
    it(`shows the ${kind} demo with verdict, tables, plot and cautions`, () => {
      const { doc, results } = demo(kind);
      const html = renderToText(h(ResultsView, { doc, results, stale: false, computing: false, errorsCount: 0 }));
      expectWellFormed(html);
      const text = textOf(html);
      expect(text).toContain('Resonance verdict:');
      expect(text).toMatch(/Lowest dry frequency \S+ Hz; lowest wet frequency \S+ Hz/);
      expect(text).toContain('Mass per');
      expect(text).toContain('Resonance checks, every mode against every excitation');
      expect(html).toContain('aria-pressed="true"');
      expect(html).toContain('class="member-plot"');
      expect(html).toContain('class="freq-chart"');
      if (doc.unitSystem === 'us') expect(text).toContain('lb/ft');
      else expect(text).toContain('kg/m');
    });
  }

  it('keeps the last results with an out-of-date marker that counts the errors', () => {
    const { doc, results } = demo('pile');
    const text = textOf(renderToText(h(ResultsView, { doc, results, stale: true, computing: false, errorsCount: 2 })));
    expect(text).toContain('Out of date: the inputs have 2 errors.');
    expect(text).toContain('Natural frequencies');
  });

  it('says what to do when there are no results', () => {
    const { doc } = demo('pile');
    const html = renderToText(h(ResultsView, { doc, results: null, stale: false, computing: false, errorsCount: 0 }));
    expectWellFormed(html);
    expect(textOf(html)).toContain('Fill in the Member form');
  });

  it('shows a buckling member in plain words', () => {
    const { doc, results } = demo('riser');
    const failed: Results = { ...results, answer: { ok: false, reason: 'buckles', message: 'buckles under this load: stiffness is not positive definite' } };
    const text = textOf(renderToText(h(ResultsView, { doc, results: failed, stale: false, computing: false, errorsCount: 0 })));
    expect(text).toContain('This member buckles under the given compression');
  });
});

describe('Report renders every demo case', () => {
  for (const kind of ['pile', 'riser', 'baffle', 'stem'] as const) {
    it(`prints the ${kind} demo with inputs, results, sources, cautions and link`, () => {
      const { doc, results } = demo(kind);
      const html = renderToText(h(ReportView, { doc, results, link: 'https://example.invalid/#c=abc', appVersion: '0.1.0' }));
      expectWellFormed(html);
      const text = textOf(html);
      expect(text).toContain('Wetmode screening report');
      expect(text).toContain(doc.name);
      expect(text).toContain(doc.tag);
      expect(text).toContain('Member inputs');
      expect(text).toContain('Resonance inputs');
      expect(text).toContain('Method and sources');
      expect(text).toContain('Print or save as PDF');
      expect(text).toContain('https://example.invalid/#c=abc');
      expect(text).not.toContain('These results were computed for earlier inputs');
    });
  }

  it('says when there is no link and when the results belong to earlier inputs', () => {
    const { doc, results } = demo('stem');
    const changed = { ...doc, inputs: { ...doc.inputs, insertionLength: '200 mm' } };
    const text = textOf(renderToText(h(ReportView, { doc: changed, results, link: null, appVersion: '0.1.0' })));
    expect(text).toContain('Link not available.');
    expect(text).toContain('These results were computed for earlier inputs');
  });

  it('shows names with markup as text', () => {
    const { doc, results } = demo('pile');
    const html = renderToText(h(ReportView, { doc: { ...doc, name: '<img src=x onerror=alert(1)>' }, results, link: null, appVersion: '0.1.0' }));
    expect(html).not.toContain('<img');
    expect(html).toContain('&lt;img src=x onerror=alert(1)&gt;');
  });
});
