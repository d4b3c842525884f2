import { describe, expect, it } from 'vitest';
import { evaluateWithUnits, isUnit, loadUnitReader, unitReaderLoaded } from '../../src/units/math-on-demand';
import { isUnitReaderPending } from '../../src/units/reader-pending';
import { expectClose } from '../helpers/expect-close';

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
      evaluateWithUnits('2 ft + 6 in');
    } catch (e) {
      thrown = e;
    }
    expect(isUnitReaderPending(thrown)).toBe(true);
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
