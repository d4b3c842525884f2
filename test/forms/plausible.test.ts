/**
 * Plausibility of the form inputs: hard ranges refuse with the range in the user's units, soft ranges accept
 * with a warning that names the field, the range and its basis. The ranges are the project's rules
 * (docs/sources.md §S7 liquids, §S8 marine growth, §S13 beam theory); the checks here are on the wording and on
 * which side of each line a value falls.
 */
import { describe, expect, it } from 'vitest';
import type { FieldValues, MemberForm, UnitSystem } from '../../src/forms';
import { DEMO_CASES, FORMS } from '../../src/kinds/registry';
import type { KindBuild } from '../../src/kinds/common/types';
import { KINDS } from '../../src/kinds/registry';
import { readExcitation } from '../../src/forms/excitation';

type AnyForm = MemberForm<unknown, KindBuild>;
const form = (k: keyof typeof FORMS): AnyForm => FORMS[k] as AnyForm;

function refused(f: AnyForm, values: FieldValues, system: UnitSystem = 'si'): Record<string, string> {
  const r = f.toInput(values, system);
  if (r.ok) throw new Error(`expected a refusal, got warnings ${JSON.stringify(r.warnings)}`);
  return r.errors;
}

function accepted(f: AnyForm, values: FieldValues, system: UnitSystem = 'si'): Record<string, string> {
  const r = f.toInput(values, system);
  if (!r.ok) throw new Error(`expected the input to be accepted, got ${JSON.stringify(r.errors)}`);
  return r.warnings;
}

describe('liquid density', () => {
  it('refuses 1.025 kg/m³ with the allowed range and asks whether 1025 kg/m³ or 1.025 t/m³ was meant', () => {
    const e = refused(form('pile'), { liquidDensity: '1.025' });
    expect(e.liquidDensity).toMatch(/^liquid density must be at least 500 kg\/m³/);
    expect(e.liquidDensity).toContain('500 kg/m³ to 2000 kg/m³');
    expect(e.liquidDensity).toContain('did you mean 1025 kg/m³ or 1.025 t/m³?');
  });

  it('refuses 2500 kg/m³ as above the hard range, on every kind with a liquid', () => {
    for (const k of ['pile', 'riser', 'stem', 'baffle'] as const) {
      expect(refused(form(k), { liquidDensity: '2500' }).liquidDensity, k).toMatch(/^liquid density must be at most 2000 kg\/m³/);
    }
  });

  it('refuses a specific gravity typed in US units and offers it in lb/ft³', () => {
    const e = refused(form('pile'), form('pile').defaults('us') && { ...form('pile').defaults('us'), liquidDensity: '1.025' }, 'us');
    expect(e.liquidDensity).toMatch(/liquid density must be at least/);
    expect(e.liquidDensity).toContain('specific gravity of 1.025');
  });

  it('accepts 1200 kg/m³ around a pile with a warning that names the water range 950 to 1100 kg/m³ and its basis', () => {
    const w = accepted(form('pile'), { liquidDensity: '1200' });
    expect(w.liquidDensity).toContain('liquid density 1200 kg/m³ is outside the usual 950 kg/m³ to 1100 kg/m³');
    expect(w.liquidDensity).toContain('docs/sources.md §S7');
  });

  it('gives no warning for seawater at 1025 kg/m³ or for a fuel of 820 kg/m³ around a sensor stem', () => {
    expect(accepted(form('pile'), { liquidDensity: '1025' }).liquidDensity).toBeUndefined();
    expect(accepted(form('stem'), { liquidDensity: '820' }).liquidDensity).toBeUndefined();
  });
});

describe('marine growth', () => {
  it('warns about 0.5 m of growth, naming the 300 mm soft limit and NORSOK N-003', () => {
    const w = accepted(form('pile'), { growthThickness: '500' });
    expect(w.growthThickness).toContain('marine growth thickness 500 mm is outside the usual at most 300 mm');
    expect(w.growthThickness).toContain('NORSOK N-003');
  });

  it('refuses 2 m of growth with the 1 m hard limit in the user units', () => {
    expect(refused(form('pile'), { growthThickness: '2000' }).growthThickness).toMatch(/^marine growth thickness must be at most 1000 mm/);
  });

  it('gives no warning for the default 50 mm', () => {
    expect(accepted(form('pile'), {}).growthThickness).toBeUndefined();
  });
});

describe('tube wall and slenderness', () => {
  it('warns about a 0.5 mm wall on a 610 mm pile (under 1 % of the diameter), naming local buckling and the limit 6.1 mm', () => {
    const w = accepted(form('pile'), { outerDiameter: '610', wallThickness: '0.5' });
    expect(w.wallThickness).toContain('wall thickness is under 1 % of the outer diameter (6.1 mm)');
    expect(w.wallThickness).toContain('buckle locally');
  });

  it('gives no wall warning for the default 12 mm wall on a 610 mm pile', () => {
    expect(accepted(form('pile'), {}).wallThickness).toBeUndefined();
  });

  it('refuses a riser shorter than 2 diameters, naming the length and the ratio', () => {
    const e = refused(form('riser'), { length: '0.4', outerDiameter: '273', waterSurface: '0.3', guides: '' });
    expect(e.length).toMatch(/^length must be at least 2 × the outer diameter for a beam model \(length \/ outer diameter is 1\.5/);
  });

  it('refuses an outer diameter of 1e308 m on a pile beside the field, stating the 20 m limit', () => {
    const e = refused(form('pile'), { outerDiameter: '1e308 m', wallThickness: '12' });
    expect(e.outerDiameter).toMatch(/^outer diameter must be at most 20000 mm/);
  });

  it('refuses a pile shorter than 2 diameters from its toe to its top, on the outer diameter', () => {
    const e = refused(form('pile'), { outerDiameter: '8000', wallThickness: '80', foundation: 'soil-springs', embeddedLength: '1', waterDepth: '4', topAboveWater: '1' });
    expect(e.outerDiameter).toContain('must be at least 2 × the outer diameter for a beam model (length / outer diameter is 0.75');
  });

  it('warns when a stubby stem (length / diameter 5) is forced to slender-beam theory, pointing to the Timoshenko option', () => {
    const w = accepted(form('stem'), { insertionLength: '140', rootDiameter: '28', tipDiameter: '28', beamTheory: 'euler-bernoulli' });
    expect(w.insertionLength).toContain('length / diameter is 5.0, under 10');
    expect(w.insertionLength).toContain('With shear (Timoshenko)');
  });

  it('does not warn about theory for the same stem on automatic (shear is then included)', () => {
    expect(accepted(form('stem'), { insertionLength: '140', rootDiameter: '28', tipDiameter: '28' }).insertionLength).toBeUndefined();
  });

  it('refuses a baffle span under 2 plate thicknesses', () => {
    expect(refused(form('baffle'), { span: '0.015', thickness: '10' }).span).toMatch(/^span must be at least 2 × the plate thickness/);
  });
});

describe('sensor stem diameter', () => {
  it('warns about a 1 mm stem, naming the 5 mm to 100 mm range', () => {
    const w = accepted(form('stem'), { rootDiameter: '1', tipDiameter: '1', boreDiameter: '0', insertionLength: '50' });
    expect(w.rootDiameter).toContain('root diameter 1 mm is outside the usual 5 mm to 100 mm');
    expect(w.tipDiameter).toContain('tip diameter 1 mm is outside the usual 5 mm to 100 mm');
  });

  it('gives no warning for the default 28 mm root', () => {
    expect(accepted(form('stem'), {}).rootDiameter).toBeUndefined();
  });
});

describe('contact', () => {
  it('refuses a riser touching its caisson and states the published limit for a circle touching a wall', () => {
    const e = refused(form('riser'), { outerDiameter: '273', caissonDiameter: '273' });
    expect(e.caissonDiameter).toContain('π²/3 − 1 = 2.29');
    expect(e.caissonDiameter).toContain('docs/sources.md §S3.3');
  });
});

describe('current', () => {
  const pile = KINDS.pile;
  const build = form('pile').build({}, 'si');
  if (!build.ok || build.build.engine === 'plate') throw new Error('the default pile must build');
  const member = build.build;

  it('refuses a current of 15 m/s with the 10 m/s hard limit', () => {
    const r = readExcitation(pile.resonance, { currentSurface: '15' }, 'si', member);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.currentSurface).toMatch(/^current at the surface must be at most 10 m\/s/);
  });

  it('accepts a 30-knot current only as refused, and a 3 m/s current with a warning naming 2.5 m/s', () => {
    const knots = readExcitation(pile.resonance, { currentSurface: '30 kn' }, 'si', member);
    expect(knots.ok).toBe(false);
    const r = readExcitation(pile.resonance, { currentSurface: '3' }, 'si', member);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.warnings?.currentSurface).toContain('current at the surface 3 m/s is outside the usual at most 2.5 m/s');
  });
});

describe('the beam-theory switch judges the span, not the whole member', () => {
  it('a 40 m riser guided every 2 m (span / diameter 7.3) gets shear deformation, though 40 m / 273 mm is 147', () => {
    const r = FORMS.riser.build({ guides: Array.from({ length: 19 }, (_, i) => `${2 * (i + 1)}`).join(', ') }, 'si');
    if (!r.ok) throw new Error(JSON.stringify(!r.ok && r.errors));
    expect(r.build.model.beamTheory).toBe('timoshenko');
  });

  it('the default riser (spans of many diameters) stays a slender beam', () => {
    const r = FORMS.riser.build({}, 'si');
    if (!r.ok) throw new Error('the default riser must build');
    expect(r.build.model.beamTheory).toBeUndefined();
  });

  it('forcing slender-beam theory on closely guided spans warns on the guides', () => {
    const guides = Array.from({ length: 19 }, (_, i) => `${2 * (i + 1)}`).join(', ');
    const w = accepted(form('riser'), { guides, beamTheory: 'euler-bernoulli' });
    expect(w.guides).toContain('length / outer diameter is 7.3, under 10');
  });
});

describe('the worked examples', () => {
  it('every demo case reads without a plausibility warning (they are meant as ordinary members)', () => {
    for (const demo of DEMO_CASES) {
      const r = (FORMS[demo.kind] as AnyForm).toInput(demo.values, demo.system);
      if (!r.ok) throw new Error(`${demo.kind}: ${JSON.stringify(r.errors)}`);
      expect(r.warnings, demo.kind).toEqual({});
    }
  });
});
