import { describe, expect, it } from 'vitest';
import { bandCase } from '../../src/app/band-case';
import { readCaseRanges } from '../../src/app/case-ranges';
import { excitationDefaults } from '../../src/forms/excitation';
import { applicableRanges, defaultRangeText, type RangeTexts, valuesAt } from '../../src/forms/ranges';
import { rangesOf } from '../../src/kinds/ranges-registry';
import { DEMO_CASES, FORMS, kindOf } from '../../src/kinds/registry';
import { solveMember } from '../../src/physics/beam';
import { withFixedMesh } from '../../src/physics/uncertain/evaluate';
import { FLAT_RTOL } from '../../src/physics/uncertain/monotone';
import { SEARCH_RTOL } from '../../src/physics/uncertain/search';

/** The demo riser with the kind's default ranges, as the band worker gets it. */
function riserCase() {
  const demo = DEMO_CASES.find((d) => d.kind === 'riser')!;
  const form = FORMS.riser;
  const inputs = { ...form.defaults(demo.system), ...demo.values };
  const ranges: RangeTexts = {};
  for (const def of applicableRanges(form.fields, rangesOf('riser'), inputs)) {
    const t = defaultRangeText(form.fields, def, inputs, demo.system);
    if (t) ranges[def.key] = t;
  }
  const excitation = { ...excitationDefaults(kindOf('riser').resonance, demo.system), ...(demo.excitation ?? {}) };
  return { kind: demo.kind, unitSystem: demo.system, inputs, excitation, ranges };
}

describe('the riser band against a dense grid over its default ranges (cross-check)', () => {
  it('every mode of a 7 × 7 × 7 grid lies within the band, and the sampled search ran inside its budget', () => {
    // The demo riser's wet mode 2 turns back inside the water-surface range and its dry modes 2–4 peak inside
    // the wall-thickness range at light contents, so the band comes from the sampled search for those modes.
    const c = riserCase();
    const a = bandCase(c);
    if (!a.ok || !a.band) throw new Error(a.ok ? 'no band' : a.message);
    const band = a.band;
    expect(band.method).toBe('mixed');
    expect(band.wet!.modes[1].method).toBe('sampled');
    expect(band.budgetExhausted).toBe(false);
    expect(band.solves).toBeLessThan(band.maxSolves);

    const read = readCaseRanges(c);
    if (!read.ok) throw new Error('ranges read');
    const rs = read.ranges;
    const elements = band.likely.mesh.elements;
    const n = 7;
    const states = ['dry', 'wet'] as const;
    const modes = band.dry.modes.length;
    const lo = { dry: new Array<number>(modes).fill(Infinity), wet: new Array<number>(modes).fill(Infinity) };
    const hi = { dry: new Array<number>(modes).fill(-Infinity), wet: new Array<number>(modes).fill(-Infinity) };
    const x = [0, 0, 0];
    for (let i = 0; i < n ** 3; i++) {
      for (let d = 0, r = i; d < 3; d++, r = Math.floor(r / n)) x[d] = rs[d].low + ((r % n) / (n - 1)) * (rs[d].high - rs[d].low);
      const b = FORMS.riser.build(valuesAt(FORMS.riser.fields, c.inputs, rs, x, c.unitSystem), c.unitSystem);
      if (!b.ok) throw new Error('builds');
      // Same fixed mesh as the band's solves.
      const s = solveMember(withFixedMesh(b.build.model, elements));
      if (!s.ok) throw new Error(s.message);
      for (const st of states) {
        s.result[st]!.frequenciesHz.forEach((f, j) => {
          lo[st][j] = Math.min(lo[st][j], f);
          hi[st][j] = Math.max(hi[st][j], f);
        });
      }
    }
    for (const st of states) {
      for (let j = 0; j < modes; j++) {
        const m = band[st]!.modes[j];
        // The band's ends are solved values, so they cannot lie beyond the true extremes; the grid must find
        // nothing beyond them by more than the method's own tolerance: SEARCH_RTOL where the sampled search
        // stopped, FLAT_RTOL where the corner method took a turn smaller than that as flat (wet mode 3 dips by
        // about 1e-5 inside the water-surface range).
        const tol = m.method === 'sampled' ? SEARCH_RTOL : FLAT_RTOL;
        expect(lo[st][j], `${st} mode ${j + 1} grid low (${m.method})`).toBeGreaterThanOrEqual(m.lowHz * (1 - tol));
        expect(hi[st][j], `${st} mode ${j + 1} grid high (${m.method})`).toBeLessThanOrEqual(m.highHz * (1 + tol));
      }
    }
  });
});
