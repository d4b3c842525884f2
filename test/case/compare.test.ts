import { describe, expect, it } from 'vitest';
import { createCase, parseCase, sameCaseContent } from '../../src/case';
import { demoCase } from './fixtures';

describe('sameCaseContent', () => {
  it('ignores times, app version, key result and the order of fields', () => {
    const a = demoCase();
    const reversed = Object.fromEntries(Object.entries(a.inputs).reverse());
    const b = { ...a, inputs: reversed, updatedAt: '2027-01-01T00:00:00Z', appVersion: '9.9.9', keyResult: undefined };
    expect(sameCaseContent(a, b)).toBe(true);
  });

  it('sees a change in any entered value, name, tag, note, kind or units', () => {
    const a = demoCase();
    const changes = [
      { name: 'Pile B8' },
      { tag: 'X' },
      { note: '' },
      { kind: 'riser' as const },
      { unitSystem: 'us' as const },
      { inputs: { ...a.inputs, length: '25 m' } },
      { inputs: { ...a.inputs, extra: '1' } },
      { excitation: {} },
    ];
    for (const change of changes) expect(sameCaseContent(a, { ...a, ...change }), JSON.stringify(change)).toBe(false);
  });

  it('is symmetric: an extra field on either side is a change', () => {
    const a = demoCase();
    const b = { ...a, excitation: { ...a.excitation, extra: '1' } };
    expect(sameCaseContent(a, b)).toBe(sameCaseContent(b, a));
  });
});

describe('createCase', () => {
  it('makes an empty case that passes parseCase', () => {
    const c = createCase({ id: 'AAAAAAAA-1111-4222-8333-444444444444', nowIso: '2026-05-01T12:00:00.000Z', appVersion: '0.1.0', kind: 'riser', unitSystem: 'si' });
    expect(parseCase(c)).toEqual({ ok: true, value: c });
    expect([c.id, c.name, c.createdAt, c.updatedAt]).toEqual(['aaaaaaaa-1111-4222-8333-444444444444', '', '2026-05-01T12:00:00.000Z', '2026-05-01T12:00:00.000Z']);
  });
});
