import { describe, expect, it, vi } from 'vitest';
import { h } from 'preact';

// Rendered by calling the components (render-text.ts); ScrollTable's hooks return their initial values.
vi.mock('preact/hooks', () => ({
  useState: <T,>(init: T | (() => T)) => [typeof init === 'function' ? (init as () => T)() : init, () => {}],
  useEffect: () => {},
  useRef: <T,>(init: T) => ({ current: init }),
}));

import { bandCase } from '../../../src/app/band-case';
import { caseFromDemo } from '../../../src/app/create-case';
import { DEMO_CASES } from '../../../src/kinds/registry';
import { BandPanel } from '../../../src/ui/results/BandPanel';
import { hzRange } from '../../../src/ui/results/band-rows';
import { renderToText, textOf } from './render-text';

describe('the band panel', () => {
  const doc = caseFromDemo(DEMO_CASES.find((d) => d.kind === 'pile')!);
  const answer = bandCase({ ...doc, ranges: { fixityDepth: { low: '2.667', high: '6.096', on: true }, topMass: { low: '9', high: '15', on: true } } });

  it('shows the band mode by mode, the method, one bar and one row per input (largest swing first), in the user units', () => {
    if (!answer.ok || !answer.band) throw new Error('a band');
    const html = renderToText(h(BandPanel, { state: { status: 'done', answer, forKey: 'k', message: null }, current: true }));
    const text = textOf(html);
    expect(text).toContain('Fixity depth below mudline 2.667 m to 6.096 m (likely 4.572 m)');
    expect(text).toContain(`Method: ${answer.band.methodText}`);
    expect(html.match(/class="sens-row"/g)).toHaveLength(2);
    const w = answer.band.wet!.modes[0];
    expect(text).toContain(hzRange(w.lowHz, w.highHz));
    // Fixity moves the first mode of this pile more than a ±25 % top mass (both solved above): its row comes first.
    const fixRow = text.indexOf('Fixity depth below mudline 2.667 m to 6.096 m 0.');
    const massRow = text.indexOf('Top mass 9 t to 15 t 0.');
    expect(fixRow).toBeGreaterThan(-1);
    expect(massRow).toBeGreaterThan(fixRow);
  });

  it('says the band is being worked out, and shows nothing without ranges', () => {
    expect(textOf(renderToText(h(BandPanel, { state: { status: 'working', answer: null, forKey: null, message: null }, current: false })))).toContain('Working out the band…');
    expect(renderToText(h(BandPanel, { state: { status: 'none', answer: null, forKey: null, message: null }, current: false }))).toBe('');
  });
});
