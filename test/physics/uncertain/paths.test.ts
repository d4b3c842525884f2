import { describe, expect, it } from 'vitest';
import { getNumberAt, withNumberAt } from '../../../src/physics/uncertain/paths';
import { resolveRanges, MAX_RANGED_INPUTS } from '../../../src/physics/uncertain/ranges';
import { uniformMember } from '../beam/fixtures';

const model = uniformMember(
  10,
  [{ atM: 0, kind: 'clamped' }],
  { masses: [{ atM: 10, massKg: 500 }], liquid: { densityKgPerM3: 1025, fromM: 0, toM: 6 } },
  { coating: { thicknessM: 0.05, densityKgPerM3: 1325 } },
);

describe('dotted paths into the member model', () => {
  it('reads numbers by dotted path and by the bracket form of validation messages', () => {
    expect(getNumberAt(model, 'masses.0.massKg')).toEqual({ ok: true, value: 500 });
    expect(getNumberAt(model, 'liquid.toM')).toEqual({ ok: true, value: 6 });
    expect(getNumberAt(model, 'segments[0].coating.thicknessM')).toEqual({ ok: true, value: 0.05 });
  });

  it('writes into a copy and leaves the model as it was', () => {
    const before = JSON.stringify(model);
    const copy = withNumberAt(model, 'segments.0.coating.thicknessM', 0.1);
    expect(copy.segments[0].coating!.thicknessM).toBe(0.1);
    expect(JSON.stringify(model)).toBe(before);
  });

  it('refuses a missing key, an index out of range, a non-number and prototype keys, naming the path', () => {
    const msg = (p: string) => {
      const r = getNumberAt(model, p);
      return r.ok ? '' : r.message;
    };
    expect(msg('liquid.depthM')).toContain('no such key "depthM"');
    expect(msg('masses.3.massKg')).toContain('index 3 is out of range');
    expect(msg('segments.0.section')).toContain('must lead to a number');
    expect(msg('__proto__.x')).toContain('"__proto__" is not a field');
    expect(msg('liquid.constructor')).toContain('"constructor" is not a field');
    expect(msg('masses.x.massKg')).toContain('must be an index');
    expect(msg('modes')).toContain('solver setting');
    expect(msg('')).toContain('non-empty');
    expect(() => withNumberAt(model, 'liquid.toM', NaN)).toThrow('finite number');
  });
});

describe('ranges on uncertain inputs', () => {
  it('resolves each range with the model’s own value as the likely value', () => {
    expect(resolveRanges(model, [{ path: 'liquid.toM', low: 3, high: 7.5 }])).toEqual([{ path: 'liquid.toM', low: 3, high: 7.5, likely: 6 }]);
  });

  it('refuses low above high, a likely value outside, a bad path, a repeat and too many, naming them', () => {
    expect(() => resolveRanges(model, [{ path: 'liquid.toM', low: 8, high: 3 }])).toThrow('ranges[0] (liquid.toM): low 8 is above high 3');
    expect(() => resolveRanges(model, [{ path: 'liquid.toM', low: 7, high: 8 }])).toThrow('own value 6 lies outside [7, 8]');
    expect(() => resolveRanges(model, [{ path: 'masses.1.massKg', low: 0, high: 1 }])).toThrow('ranges[0]: path "masses.1.massKg": index 1 is out of range');
    const r = { path: 'liquid.toM', low: 3, high: 7 };
    expect(() => resolveRanges(model, [r, r])).toThrow('ranged twice');
    expect(() => resolveRanges(model, Array.from({ length: MAX_RANGED_INPUTS + 1 }, () => r))).toThrow(`at most ${MAX_RANGED_INPUTS}`);
    expect(() => resolveRanges(model, [{ path: 'masses.0.massKg', low: -5, high: 600 }])).toThrow('low -5 makes the member invalid: masses[0].massKg must be a finite number ≥ 0');
    expect(() => resolveRanges(model, { path: 'liquid.toM' })).toThrow('ranges must be a list');
  });
});
