import { describe, expect, it } from 'vitest';
import { FORM_ERROR_KEY } from '../../src/forms';
import { FORMS, KIND_IDS as MEMBER_KINDS } from '../../src/kinds/registry';
import { readCase } from '../../src/app/read-case';
import { buildFailure, firstNonFinite } from '../../src/forms/total-build';

describe('reading a case never throws', () => {
  it('a pile outer diameter of 1e308 m (6 × D overflows) gives a message on the diameter (its 20 m limit), not a TypeError', () => {
    const inputs = { ...FORMS.pile.defaults('si'), outerDiameter: '1e308 m', wallThickness: '12 mm' };
    let reading: ReturnType<typeof readCase> | undefined;
    expect(() => {
      reading = readCase({ kind: 'pile', unitSystem: 'si', inputs, excitation: {} });
    }).not.toThrow();
    expect(reading!.ok).toBe(false);
    if (reading!.ok) return;
    expect(reading!.errors.outerDiameter).toMatch(/^outer diameter must be at most 20000 mm/);
  });

  it('huge and tiny values in every numeric field of every kind give messages, never a throw or a non-finite model', () => {
    for (const kind of MEMBER_KINDS) {
      const form = FORMS[kind];
      for (const f of form.fields) {
        if (f.type === 'choice') continue;
        for (const text of ['1e308', '-1e308', '1e-308', '1e300', '9e307']) {
          const inputs = { ...form.defaults('si'), [f.key]: text };
          const r = readCase({ kind, unitSystem: 'si', inputs, excitation: {} });
          if (r.ok) expect(firstNonFinite(r.build, 'build'), `${kind}.${f.key} = ${text}`).toBeNull();
          else expect(Object.keys(r.errors).length, `${kind}.${f.key} = ${text}`).toBeGreaterThan(0);
        }
      }
    }
  });

  it('a build failure with no extreme value in any field gives a form-wide message with the reason', () => {
    const errors = buildFailure(FORMS.pile.fields, new Map([['outerDiameter', 0.61]]), 'x is not a finite number');
    expect(Object.keys(errors)).toEqual([FORM_ERROR_KEY]);
    expect(errors[FORM_ERROR_KEY]).toMatch(/cannot be computed \(x is not a finite number\)/);
  });
});

describe('firstNonFinite', () => {
  it('names the path of the first non-finite number, in nested arrays, objects and typed arrays', () => {
    expect(firstNonFinite({ a: 1, b: [2, { c: Infinity }] })).toBe('model.b[1].c');
    expect(firstNonFinite({ f: new Float64Array([1, NaN]) })).toBe('model.f[1]');
    expect(firstNonFinite({ a: 1, s: 'x', n: null })).toBeNull();
  });
});
