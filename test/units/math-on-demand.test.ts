import { describe, expect, it } from 'vitest';
import { evaluateWithUnits, isUnit, loadUnitReader, unitReaderLoaded } from '../../src/units/math-on-demand';
import { isUnitReaderPending } from '../../src/units/reader-pending';
import { expectClose } from '../helpers/expect-close';
import { normaliseText } from '../../src/units/parse';

// The order matters here: the module holds whether mathjs has loaded, and these tests walk it from before to after.
describe('the unit reader on demand', () => {
  it('reads plain entries before mathjs has loaded and says when it needs it', () => {
    expect(unitReaderLoaded()).toBe(false);
    const r = evaluateWithUnits('610 mm');
    expect(r.namedUnits).toBe(true);
    if (!isUnit(r.value)) throw new Error('610 mm was not read as a unit');
    expectClose(r.value.value!, 0.61, { rtol: 1e-15, label: '610 mm in m (exact by definition of the millimetre; rounding only)' });
    let thrown: unknown = null;
    try {
      evaluateWithUnits('1/2 in');
    } catch (e) {
      thrown = e;
    }
    expect(isUnitReaderPending(thrown)).toBe(true);
  });

  it('reads knots, inch and foot marks and feet-and-inches before mathjs has loaded', () => {
    expect(unitReaderLoaded()).toBe(false);
    // The app's reading path: trade notation rewritten (parse.ts), then read by the on-demand reader.
    const si = (typed: string): number => {
      const n = normaliseText(typed);
      if (!n.ok) throw new Error(n.message);
      const r = evaluateWithUnits(n.text);
      if (!isUnit(r.value)) throw new Error(`${typed} was not read as a unit`);
      return r.value.value!;
    };
    // International knot = 1852 m per hour (exact by definition); rtol for rounding only.
    expectClose(si('1.5 kt'), (1.5 * 1852) / 3600, { rtol: 1e-12, label: '1.5 kt in m/s' });
    // International inch = 25.4 mm (exact by definition).
    expectClose(si('24"'), 0.6096, { rtol: 1e-12, label: '24" in m' });
    // 30 in × 0.0254 m/in = 0.762 m (international inch, exact).
    expectClose(si(`2' 6"`), 0.762, { rtol: 1e-12, label: `2' 6" in m` });
    expectClose(si('2 ft 6 in'), 0.762, { rtol: 1e-12, label: '2 ft 6 in in m' });
    expect(unitReaderLoaded()).toBe(false);
  });

  it('once mathjs has loaded, reads any expression mathjs reads', async () => {
    await loadUnitReader();
    expect(unitReaderLoaded()).toBe(true);
    const r = evaluateWithUnits('2 ft + 6 in');
    if (!isUnit(r.value)) throw new Error('2 ft + 6 in was not read as a unit');
    // 30 in × 0.0254 m/in = 0.762 m (international inch, exact); rtol for rounding in mathjs's sum.
    expectClose(r.value.value!, 0.762, { rtol: 1e-12, label: '2 ft + 6 in in m' });
  });
});
