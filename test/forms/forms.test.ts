import { describe, expect, it } from 'vitest';
import { parseMemberModel } from '../../src/physics/beam';
import { parsePlateInput } from '../../src/physics/plate';
import {
  FORM_ERROR_KEY,
  type FieldValues,
  isShown,
  type MemberForm,
  type MemberKind,
  placeholderOf,
  type UnitSystem,
} from '../../src/forms';
import { parseQuantity, parseQuantityList } from '../../src/units';
import { expectClose } from '../helpers/expect-close';
import { DEMO_CASES, FORMS, KIND_IDS as MEMBER_KINDS } from '../../src/kinds/registry';
import type { KindBuild } from '../../src/kinds/common/types';

const SYSTEMS: UnitSystem[] = ['si', 'us'];

function errorsOf(form: MemberForm<unknown, KindBuild>, values: FieldValues, system: UnitSystem) {
  const r = form.toInput(values, system);
  if (r.ok) throw new Error(`expected errors, got input ${JSON.stringify(r.input)}`);
  return r.errors;
}

/** SI value of every quantity field, to compare value sets typed in different systems. */
function siValues(form: MemberForm<unknown, KindBuild>, values: FieldValues, system: UnitSystem): Record<string, number | number[] | string> {
  const out: Record<string, number | number[] | string> = {};
  for (const f of form.fields) {
    const text = values[f.key];
    if (text === undefined) continue;
    if (f.type === 'choice' || text.trim() === '') out[f.key] = text;
    else if (f.type === 'quantity') {
      const r = parseQuantity(text, { dimension: f.dimension, unit: f.units[system] });
      out[f.key] = r.ok ? r.valueSI : text;
    } else {
      const r = parseQuantityList(text, { dimension: f.dimension, unit: f.units[system] });
      out[f.key] = r.ok ? r.valuesSI : text;
    }
  }
  return out;
}

function expectSameValues(a: Record<string, number | number[] | string>, b: Record<string, number | number[] | string>, label: string): void {
  expect(Object.keys(b).sort()).toEqual(Object.keys(a).sort());
  for (const [k, v] of Object.entries(a)) {
    const w = b[k];
    // Entry texts keep values to 1e-6 (formatForEntry); rtol 2e-6 allows one conversion each way.
    if (typeof v === 'number') expectClose(w as number, v, { rtol: 2e-6, atol: 1e-12, label: `${label} ${k}` });
    else if (Array.isArray(v)) v.forEach((x, i) => expectClose((w as number[])[i], x, { rtol: 2e-6, label: `${label} ${k}[${i}]` }));
    else expect(w, `${label} ${k}`).toBe(v);
  }
}

/** The beam engine's or the plate engine's own gate takes the build's model. */
function expectEngineAccepts(build: KindBuild): void {
  if (build.engine === 'plate') expect(() => parsePlateInput(build.plate)).not.toThrow();
  else expect(() => parseMemberModel(build.model)).not.toThrow();
}

describe.each(MEMBER_KINDS)('the %s form', (kind: MemberKind) => {
  const form = FORMS[kind] as MemberForm<unknown, KindBuild>;

  it('has at most twelve main fields shown with its defaults, each with a label and a default', () => {
    const values = form.defaults('si');
    const main = form.fields.filter((f) => !f.advanced && isShown(form.fields, f, values));
    expect(main.length).toBeLessThanOrEqual(12);
    for (const f of form.fields) {
      expect(f.label.length, f.key).toBeGreaterThan(0);
      if (!f.optional && f.type !== 'choice') expect(f.default.trim().length, `${f.key} default`).toBeGreaterThan(0);
    }
  });

  it.each(SYSTEMS)('defaults read and build a model its engine accepts (%s units)', (system) => {
    const r = form.build(form.defaults(system), system);
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.build.kind).toBe(kind);
    expectEngineAccepts(r.build);
  });

  it('defaults in US units are the SI defaults re-expressed (same SI input)', () => {
    const si = form.toInput(form.defaults('si'), 'si');
    const us = form.toInput(form.defaults('us'), 'us');
    if (!si.ok || !us.ok) throw new Error('defaults did not read');
    expect(JSON.stringify(us.input, (_k, v) => (typeof v === 'number' ? Number(v.toPrecision(5)) : v))).toBe(
      JSON.stringify(si.input, (_k, v) => (typeof v === 'number' ? Number(v.toPrecision(5)) : v)),
    );
  });

  it('its demo case reads in its own units and builds a model its engine accepts', () => {
    const demos = DEMO_CASES.filter((d) => d.kind === kind);
    expect(demos.length).toBe(1);
    const demo = demos[0];
    const r = form.build(demo.values, demo.system);
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expectEngineAccepts(r.build);
    expect(demo.name.length * demo.tag.length * demo.note.length).toBeGreaterThan(0);
    // Values typed with units read the same whichever system is chosen.
    const other = form.toInput(demo.values, demo.system === 'si' ? 'us' : 'si');
    expect(other.ok && JSON.stringify(other.input)).toBe(JSON.stringify(r.input));
  });

  it.each(SYSTEMS)('toggling the unit system and back keeps every value (%s first)', (start) => {
    const back = start === 'si' ? 'us' : 'si';
    for (const values of [form.defaults(start), DEMO_CASES.find((d) => d.kind === kind)!.values]) {
      const there = form.convertValues(values, start, back);
      const again = form.convertValues(there, back, start);
      expectSameValues(siValues(form, values, start), siValues(form, there, back), `${kind} ${start}→${back}`);
      expectSameValues(siValues(form, values, start), siValues(form, again, start), `${kind} round trip`);
    }
    // Defaults come back as the very text first shown (values of at most five figures).
    expect(form.convertValues(form.convertValues(form.defaults('si'), 'si', 'us'), 'us', 'si')).toEqual(form.defaults('si'));
  });

  it('a length where a density belongs is refused beside the field, in words', () => {
    expect(errorsOf(form, { liquidDensity: '5 m' }, 'si')).toEqual({
      liquidDensity: 'expected a density such as 1025 kg/m^3 or 64 lb/ft^3, got a length (5 m)',
    });
    expect(errorsOf(form, { liquidDensity: '-3' }, 'si')).toEqual({ liquidDensity: 'liquid density must be at least 500 kg/m³ (allowed: 500 kg/m³ to 2000 kg/m³)' });
    expect(errorsOf(form, { material: 'bronze' }, 'si').material).toMatch(/^choose one of: /);
  });
});

describe('form readings (hand-checked values)', () => {
  it('pile defaults read as 610 × 12 mm carbon steel, 6 D fixity, 50 mm growth from +2 m to −40 m', () => {
    const r = FORMS.pile.toInput(FORMS.pile.defaults('si'), 'si');
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.input).toEqual({
      outerDiameterM: 0.61,
      wallThicknessM: 0.012,
      youngsModulusPa: 210e9,
      materialDensityKgPerM3: 7850,
      waterDepthM: 8,
      topAboveStillWaterM: 3,
      waterLevelOffsetM: 0,
      foundation: { kind: 'fixity' },
      topMassKg: 0,
      topRotaryInertiaKgM2: 0,
      flooded: true,
      liquidDensityKgPerM3: 1025,
      endEffect3d: false,
      beamTheory: 'auto',
      marineGrowth: { thicknessM: 0.05, densityKgPerM3: 1325, topAboveStillWaterM: 2, bottomBelowStillWaterM: 40 },
    });
  });

  it('the riser demo typed in US units reads 12.75 in = 0.32385 m, guides in feet, gas at 100 kg/m³', () => {
    const demo = DEMO_CASES.find((d) => d.kind === 'riser')!;
    const r = FORMS.riser.toInput(demo.values, 'us');
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    // NIST SP 811: in = 0.0254 m, ft = 0.3048 m (exact). Rounding only: rtol 1e-12.
    expectClose(r.input.outerDiameterM, 0.32385, { rtol: 1e-12, label: 'OD' });
    r.input.guideElevationsM.forEach((z, i) => expectClose(z, [30, 62, 94, 126][i] * 0.3048, { rtol: 1e-12, label: `guide ${i + 1}` }));
    expect(r.input.contentsDensityKgPerM3).toBe(100);
    expectClose(r.input.caisson!.innerDiameterM, 0.6096, { rtol: 1e-12, label: 'caisson' });
  });

  it('a material preset fills modulus and density unless they are typed; "Other" asks for them', () => {
    const stainless = FORMS.pile.toInput({ material: 'stainless-316' }, 'si');
    expect(stainless.ok && [stainless.input.youngsModulusPa, stainless.input.materialDensityKgPerM3]).toEqual([193e9, 8000]);
    const typed = FORMS.pile.toInput({ material: 'stainless-316', youngsModulus: '200' }, 'si');
    expect(typed.ok && typed.input.youngsModulusPa).toBe(200e9);
    expect(errorsOf(FORMS.pile, { material: 'other' }, 'si')).toEqual({
      youngsModulus: `enter young's modulus: "Other" has no preset value`,
      materialDensity: 'enter material density: "Other" has no preset value',
    });
    expect(placeholderOf(FORMS.pile, 'youngsModulus', { material: 'carbon-steel' }, 'si')).toBe('210');
    expect(placeholderOf(FORMS.pile, 'materialDensity', { material: 'stainless-316' }, 'si')).toBe('8000');
    expect(placeholderOf(FORMS.pile, 'fixityDepth', {}, 'si')).toBe('6 × outer diameter');
  });

  it('fields hidden by another choice are not read, even if they hold rubbish', () => {
    const r = FORMS.pile.toInput({ foundation: 'fixity', soilModulus: 'rubbish' }, 'si');
    expect(r.ok).toBe(true);
    expect(errorsOf(FORMS.pile, { foundation: 'soil-springs', soilModulus: 'rubbish' }, 'si').soilModulus).toBe(
      '"rubbish" is not a unit Wetmode knows; expected a soil spring modulus such as 5 MN/m^2 or 725 psi',
    );
  });
});

describe('cross-field messages are given in the user’s units', () => {
  it('a wall thicker than the radius names half the diameter in mm or inches', () => {
    expect(errorsOf(FORMS.pile, { outerDiameter: '610', wallThickness: '320' }, 'si')).toEqual({
      wallThickness: 'wall thickness must be less than half the outer diameter (305 mm)',
    });
    expect(errorsOf(FORMS.riser, { outerDiameter: '24', wallThickness: '13' }, 'us')).toEqual({
      wallThickness: 'wall thickness must be less than half the outer diameter (12 in)',
    });
  });

  it('pile: a top below the mudline and an upside-down growth zone', () => {
    expect(errorsOf(FORMS.pile, { waterDepth: '8', topAboveWater: '-9' }, 'si').topAboveWater).toBe('top above still water must be more than -8 m so the top is above the mudline');
    expect(errorsOf(FORMS.pile, { growthTop: '-5', growthBottom: '3' }, 'si').growthBottom).toBe('the bottom of the growth zone must be below its top: enter more than 5 m');
  });

  it('riser: guides above the top, repeated guides, water below its start, a small caisson, too few supports', () => {
    expect(errorsOf(FORMS.riser, { length: '40', guides: '10, 45' }, 'si').guides).toBe('guide heights must be below the top end (40 m); 45 m is not');
    expect(errorsOf(FORMS.riser, { guides: '10; 20; 20' }, 'si').guides).toBe('guide heights must differ: 20 m appears twice');
    expect(errorsOf(FORMS.riser, { waterBottom: '5', waterSurface: '5' }, 'si').waterSurface).toBe('the water surface must be above where the water starts (5 m)');
    expect(errorsOf(FORMS.riser, { outerDiameter: '12.75', caissonDiameter: '14', caissonOffset: '1' }, 'us').caissonDiameter).toBe(
      "caisson inner diameter must be more than the riser's outer diameter with coating plus twice the offset (14.75 in). A member touching the wall is outside the section model (for a circle touching a plane wall, 2D potential flow gives the finite limit Ca = π²/3 − 1 = 2.29, docs/sources.md §S3.3).",
    );
    expect(errorsOf(FORMS.riser, { bottomEnd: 'free', guides: '10' }, 'si').bottomEnd).toBe(
      'these ends and guides leave the riser free to move: add a guide, or make an end clamped or pinned',
    );
    expect(errorsOf(FORMS.riser, { guides: '10, 5 kg' }, 'si').guides).toBe('item 2 ("5 kg"): expected a length such as 610 mm or 24 in, got a mass (5 kg)');
  });

  it('baffle: a plate thicker than wide, loose ends, too many holes', () => {
    expect(errorsOf(FORMS.baffle, { width: '300', thickness: '300' }, 'si').thickness).toBe('thickness must be less than the width (300 mm)');
    expect(errorsOf(FORMS.baffle, { lowerEnd: 'bolted', upperEnd: 'free' }, 'si').upperEnd).toBe(
      'with these ends the plate can swing or slide: make one end welded, or both bolted',
    );
    expect(errorsOf(FORMS.baffle, { perforation: '60' }, 'si').perforation).toBe('perforation (open area) must be at most 50 % (allowed: 0 % to 50 %)');
  });

  it('stem: a bore as wide as the tip and a sleeve no wider than the stem', () => {
    expect(errorsOf(FORMS.stem, { tipDiameter: '22', boreDiameter: '22' }, 'si').boreDiameter).toBe('bore must be less than the tip diameter (22 mm)');
    expect(errorsOf(FORMS.stem, { rootDiameter: '1.1', tipDiameter: '0.9', boreDiameter: '0.25', surroundingDiameter: '1' }, 'us').surroundingDiameter).toBe(
      "surrounding tube inner diameter must be more than the stem's largest diameter (1.1 in). A stem touching the wall is outside the section model (for a circle touching a plane wall, 2D potential flow gives the finite limit Ca = π²/3 − 1 = 2.29, docs/sources.md §S3.3).",
    );
  });
});

describe('convertValues', () => {
  it('re-expresses typed values in the other system’s units and leaves choices, blanks and unreadable text alone', () => {
    const out = FORMS.riser.convertValues(
      { outerDiameter: '610', wallThickness: '0.5 in', guides: '3, 12 m', contents: 'gas', caissonDiameter: '', length: '4O' },
      'si',
      'us',
    );
    // 610 mm = 24.015748 in (7 figures keep 1e-6); 0.5 in stays 0.5; 3 m = 9.84252 ft, 12 m = 39.370079 ft → 39.3701 (5e-7 off).
    expect(out).toEqual({ outerDiameter: '24.01575', wallThickness: '0.5', guides: '9.84252, 39.3701', contents: 'gas', caissonDiameter: '', length: '4O' });
  });

  it('FORMS is a record of every member kind and an unknown field key cannot reach a form error silently', () => {
    const record: Record<MemberKind, MemberForm<unknown, KindBuild>> = FORMS;
    expect(Object.keys(record).sort()).toEqual([...MEMBER_KINDS].sort());
    expect(FORM_ERROR_KEY).toBe('_form');
  });
});
