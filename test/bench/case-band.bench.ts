/**
 * Time to a band for each demo case with the kind's default ranges (src/kinds/<kind>/ranges.ts), as the band
 * worker works it out: the member rebuilt from the form at every setting, the band, and the resonance verdict
 * over the band. Target: ≤ 300 ms in the worker for up to six ranged inputs. The likely answer is a separate
 * worker's job and keeps its own figures (case.bench.ts).
 */
import { APP_MAX_SOLVES, bandCase } from '../../src/app/band-case';
import { excitationDefaults } from '../../src/forms/excitation';
import { applicableRanges, defaultRangeText, type RangeTexts } from '../../src/forms/ranges';
import { rangesOf } from '../../src/kinds/ranges-registry';
import { DEMO_CASES, FORMS, kindOf } from '../../src/kinds/registry';
import { report, time } from './timing';

export function run(): void {
  for (const demo of DEMO_CASES) {
    // Ranges are listed for beam members; a plate panel has none yet.
    if (kindOf(demo.kind).engine !== 'beam') continue;
    const form = FORMS[demo.kind];
    const inputs = { ...form.defaults(demo.system), ...demo.values };
    const ranges: RangeTexts = {};
    for (const def of applicableRanges(form.fields, rangesOf(demo.kind), inputs)) {
      const t = defaultRangeText(form.fields, def, inputs, demo.system);
      if (t) ranges[def.key] = t;
    }
    const c = {
      kind: demo.kind,
      unitSystem: demo.system,
      inputs,
      excitation: { ...excitationDefaults(kindOf(demo.kind).resonance, demo.system), ...(demo.excitation ?? {}) },
      ranges,
    };
    const once = bandCase(c);
    if (!once.ok || !once.band) throw new Error(`${demo.kind}: ${once.ok ? 'no band' : once.message}`);
    const k = once.ranges.length;
    report(`${demo.kind}: band with the default ranges (${k} inputs)`, time(() => bandCase(c), 3, 1), 300);
    console.log(`  ${once.band.solves} member solves (budget ${Math.max(APP_MAX_SOLVES, 1 + 4 * k + 2 ** k)}); method: ${once.band.methodText}`);
    console.log(`  inputs: ${once.ranges.map((r) => r.key).join(', ')}; verdict ${once.verdict ? `${once.verdict.likelyVerdict} at the likely values, ${once.verdict.bandVerdict} over the band` : `not run (${once.verdictError})`}`);
  }
}
