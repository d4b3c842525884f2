import { describe, expect, it } from 'vitest';
import { defineForm, FORM_ERROR_KEY } from '../../src/forms';
import { checkingKit } from '../../src/physics/check/kit';

const KIT = checkingKit((v) => String(v));

/** A one-field form whose physics-side check (the safety net) is stricter than the form's own reading. */
function formWithSafetyNet(coreFields?: Record<string, string>) {
  return defineForm<{ spanM: number }>({
    kind: 'baffle',
    title: 'Test',
    summary: 'A form for this test only.',
    fields: [{ key: 'span', label: 'Span', type: 'quantity', dimension: 'length', units: { si: 'm', us: 'ft' }, default: '2' }],
    toInput: (r) => ({ spanM: r.num('span') }),
    validate: (input) => KIT.range('spanM', input.spanM, 0, 1, true, 'at most 1 m'),
    buildModel: () => {
      throw new Error('not reached: the check fails first');
    },
    ...(coreFields ? { coreFields } : {}),
  });
}

describe('messages from the core checks land beside the form field they are about', () => {
  it('a core field path mapped by the form puts the message on that field', () => {
    const r = formWithSafetyNet({ spanM: 'span' }).toInput({ span: '2' }, 'si');
    expect(r).toEqual({ ok: false, errors: { span: 'spanM must be at most 1 m, got 2' } });
  });

  it('an unmapped core field path falls back to the form-wide key', () => {
    const r = formWithSafetyNet().toInput({ span: '2' }, 'si');
    expect(r).toEqual({ ok: false, errors: { [FORM_ERROR_KEY]: 'spanM must be at most 1 m, got 2' } });
  });
});
