import { describe, expect, it } from 'vitest';
import { CASE_LIMITS, NEWER_VERSION_MESSAGE, parseCase, type Case } from '../../src/case';
import { copy, demoCase } from './fixtures';

/** demoCase with `change` applied (a field set, or deleted when the value is the DELETE marker). */
const DELETE = Symbol('delete');
function withField(path: string, value: unknown): Record<string, unknown> {
  const c = copy(demoCase()) as unknown as Record<string, unknown>;
  const parts = path.split('.');
  let target = c;
  for (const p of parts.slice(0, -1)) target = target[p] as Record<string, unknown>;
  const last = parts[parts.length - 1];
  if (value === DELETE) delete target[last];
  else target[last] = value;
  return c;
}

function messageOf(raw: unknown): string {
  const r = parseCase(raw);
  if (r.ok) throw new Error('expected parseCase to refuse the input');
  return r.message;
}

describe('parseCase accepts valid cases', () => {
  it('returns the demo case unchanged and without migratedFrom', () => {
    const r = parseCase(demoCase());
    expect(r).toEqual({ ok: true, value: demoCase() });
  });

  it('builds a fresh object that shares nothing with the input', () => {
    const input = demoCase();
    const r = parseCase(input);
    if (!r.ok) throw new Error(r.message);
    expect(r.value).not.toBe(input);
    expect(r.value.inputs).not.toBe(input.inputs);
    input.inputs.length = '99 m';
    expect(r.value.inputs.length).toBe('24 m');
  });

  it('is idempotent: parsing its own output gives the same case', () => {
    const once = parseCase(demoCase());
    if (!once.ok) throw new Error(once.message);
    expect(parseCase(once.value)).toEqual(once);
  });

  it('drops unknown fields and keeps the schema key order', () => {
    const r = parseCase({ extra: 1, ...demoCase(), another: { deep: true } });
    if (!r.ok) throw new Error(r.message);
    expect(Object.keys(r.value)).toEqual(Object.keys(demoCase()));
  });

  it('lower-cases the id so the same case is recognised whatever the case of its letters', () => {
    const r = parseCase(withField('id', '3F6C2A9E-8B41-4D7A-9C15-2E0B7D4F6A81'));
    expect(r.ok && r.value.id).toBe('3f6c2a9e-8b41-4d7a-9c15-2e0b7d4f6a81');
  });

  it('accepts a tab pasted into a name, tag or value', () => {
    const c = { ...demoCase(), name: 'Pile\tB7', tag: 'FH\t7', inputs: { length: '24\tm' } };
    expect(parseCase(c)).toEqual({ ok: true, value: c });
  });

  it('accepts empty name, tag, note and excitation', () => {
    const c = { ...demoCase(), name: '', tag: '', note: '', excitation: {} };
    expect(parseCase(c)).toEqual({ ok: true, value: c });
  });

  it('treats a null or empty key result as no key result', () => {
    for (const kr of [null, {}]) {
      const r = parseCase(withField('keyResult', kr));
      expect(r.ok && 'keyResult' in r.value).toBe(false);
    }
  });

  it('keeps a key result with only a verdict, or only a frequency', () => {
    const a = parseCase(withField('keyResult', { verdict: 'inside-band' }));
    const b = parseCase(withField('keyResult', { lowestWetFrequencyHz: 12.5 }));
    expect(a.ok && a.value.keyResult).toEqual({ verdict: 'inside-band' });
    expect(b.ok && b.value.keyResult).toEqual({ lowestWetFrequencyHz: 12.5 });
  });

  it('keeps names with markup as the same plain strings', () => {
    const name = '<script>alert("x")</script><img src=x onerror=alert(1)>';
    const r = parseCase({ ...demoCase(), name, tag: '<b>T</b>', note: '"><svg onload=alert(1)>\n& &amp;' });
    if (!r.ok) throw new Error(r.message);
    expect(r.value.name).toBe(name);
    expect(r.value.tag).toBe('<b>T</b>');
    expect(r.value.note).toBe('"><svg onload=alert(1)>\n& &amp;');
  });

  it('accepts dates with zone offsets, without seconds, and on 29 February of a leap year', () => {
    for (const d of ['2026-03-14T10:02+01:00', '2024-02-29T23:59:59.123456789-05:30', '2000-02-29T00:00:00Z']) {
      expect(parseCase(withField('updatedAt', d)).ok, d).toBe(true);
    }
  });

  it('accepts text exactly at each limit', () => {
    const c = {
      ...demoCase(),
      name: 'n'.repeat(CASE_LIMITS.nameChars),
      tag: 't'.repeat(CASE_LIMITS.tagChars),
      note: 'x'.repeat(CASE_LIMITS.noteChars),
      inputs: Object.fromEntries(Array.from({ length: CASE_LIMITS.fields }, (_, i) => [`f${i}`.padEnd(CASE_LIMITS.fieldNameChars, 'a'), 'v'.repeat(CASE_LIMITS.fieldValueChars)])),
    };
    expect(parseCase(c).ok).toBe(true);
  });

  it('reads a case built on a null prototype (structured clone may give one) and inherits nothing through prototypes', () => {
    const bare = Object.assign(Object.create(null), demoCase());
    expect(parseCase(bare).ok).toBe(true);
    const inherited = Object.create(demoCase());
    expect(parseCase(inherited)).toEqual({ ok: false, message: 'a case must be a JSON object, got an object' });
  });
});

describe('parseCase refuses with a message naming the field, what was expected and what was got', () => {
  const uuidWords = 'a UUID such as "3f6c2a9e-8b41-4d7a-9c15-2e0b7d4f6a81"';
  const iso = 'a date and time in ISO 8601 form such as "2026-03-14T09:21:05.000Z"';
  const cases: [string, unknown, string][] = [
    ['not an object', [1, 2, 3], 'a case must be a JSON object, got a list of 3 items'],
    ['null', null, 'a case must be a JSON object, got null'],
    ['a string', 'hello', 'a case must be a JSON object, got "hello"'],
    ['a date object', new Date(0), 'a case must be a JSON object, got an object'],
    ['format missing', withField('format', DELETE), 'format must be "wetmode-case" (this is not a Wetmode case), got nothing'],
    ['format wrong', withField('format', 'other-app'), 'format must be "wetmode-case" (this is not a Wetmode case), got "other-app"'],
    ['schemaVersion a string', withField('schemaVersion', '1'), 'schemaVersion must be a whole number from 0 to 3, got "1"'],
    ['schemaVersion fractional', withField('schemaVersion', 0.5), 'schemaVersion must be a whole number from 0 to 3, got 0.5'],
    ['schemaVersion negative', withField('schemaVersion', -1), 'schemaVersion must be a whole number from 0 to 3, got -1'],
    ['schemaVersion missing', withField('schemaVersion', DELETE), 'schemaVersion must be a whole number from 0 to 3, got nothing'],
    ['schemaVersion newer', withField('schemaVersion', 4), NEWER_VERSION_MESSAGE],
    ['schemaVersion far newer', withField('schemaVersion', 1e9), NEWER_VERSION_MESSAGE],
    ['id missing', withField('id', DELETE), `id must be ${uuidWords}, got nothing`],
    ['id not a UUID', withField('id', 'case-1'), `id must be ${uuidWords}, got "case-1"`],
    ['id a number', withField('id', 42), `id must be ${uuidWords}, got 42`],
    ['name a number', withField('name', 7), 'name must be a string of at most 200 characters, got 7'],
    ['name too long', withField('name', 'a'.repeat(201)), `name must be a string of at most 200 characters, got "${'a'.repeat(40)}"… (201 characters)`],
    ['name with a line break', withField('name', 'a\nb'), 'name must be a string on one line, without control characters other than tabs, got "a\\nb"'],
    ['name with NUL', withField('name', 'a\u0000b'), 'name must be a string on one line, without control characters other than tabs, got "a\\u0000b"'],
    ['name with a lone surrogate', withField('name', 'a\ud800b'), 'name must be a string of well-formed Unicode text (it has a broken character), got "a\\ud800b"'],
    ['tag null', withField('tag', null), 'tag must be a string of at most 100 characters, got null'],
    ['note too long', withField('note', 'x'.repeat(4001)), `note must be a string of at most 4000 characters, got "${'x'.repeat(40)}"… (4001 characters)`],
    ['note with a bell', withField('note', 'ring\u0007'), 'note must be a string without control characters other than tabs and line breaks, got "ring\\u0007"'],
    ['kind unknown', withField('kind', 'tower'), 'kind must be one of "pile", "riser", "baffle", "stem", "plate-panel", got "tower"'],
    ['kind in capitals', withField('kind', 'Pile'), 'kind must be one of "pile", "riser", "baffle", "stem", "plate-panel", got "Pile"'],
    ['unitSystem unknown', withField('unitSystem', 'metric'), 'unitSystem must be "si" or "us", got "metric"'],
    ['inputs a list', withField('inputs', ['610 mm']), 'inputs must be an object of field names to values as entered, such as { "outerDiameter": "610 mm" }, got a list of 1 item'],
    ['excitation missing', withField('excitation', DELETE), 'excitation must be an object of field names to values as entered, such as { "outerDiameter": "610 mm" }, got nothing'],
    ['input value a number', withField('inputs.outerDiameter', 610), 'inputs.outerDiameter must be a string such as "610 mm" of at most 200 characters, got 610'],
    ['input value too long', withField('inputs.length', '9'.repeat(201)), `inputs.length must be a string such as "610 mm" of at most 200 characters, got "${'9'.repeat(40)}"… (201 characters)`],
    ['input value nested', withField('excitation.currentSpeed', { value: 1.2, unit: 'm/s' }), 'excitation.currentSpeed must be a string such as "610 mm" of at most 200 characters, got an object'],
    ['input name __proto__', { ...demoCase(), inputs: JSON.parse('{"__proto__": "1 m"}') }, 'inputs field names must start with a letter and hold only letters, digits, "_", "." or "-" (at most 64 characters), got "__proto__"'],
    ['input name with a space', withField('inputs.wall thickness', '16 mm'), 'inputs field names must start with a letter and hold only letters, digits, "_", "." or "-" (at most 64 characters), got "wall thickness"'],
    ['too many inputs', { ...demoCase(), inputs: Object.fromEntries(Array.from({ length: 65 }, (_, i) => [`f${i}`, '1'])) }, 'inputs must have at most 64 fields, got 65'],
    ['createdAt free text', withField('createdAt', 'yesterday'), `createdAt must be ${iso}, got "yesterday"`],
    ['createdAt without zone', withField('createdAt', '2026-03-14T09:21:05'), `createdAt must be ${iso}, got "2026-03-14T09:21:05"`],
    ['updatedAt 31 April', withField('updatedAt', '2026-04-31T10:00:00Z'), `updatedAt must be ${iso}, with a real calendar date and time, got "2026-04-31T10:00:00Z"`],
    ['updatedAt 29 February 2100', withField('updatedAt', '2100-02-29T10:00:00Z'), `updatedAt must be ${iso}, with a real calendar date and time, got "2100-02-29T10:00:00Z"`],
    ['updatedAt hour 24', withField('updatedAt', '2026-04-30T24:00:00Z'), `updatedAt must be ${iso}, with a real calendar date and time, got "2026-04-30T24:00:00Z"`],
    ['updatedAt a number', withField('updatedAt', 1773482567880), `updatedAt must be ${iso}, got 1773482567880`],
    ['appVersion missing', withField('appVersion', DELETE), 'appVersion must be a version such as "0.1.0" (letters, digits, ".", "+", "-"; at most 32 characters), got nothing'],
    ['appVersion markup', withField('appVersion', '<b>1</b>'), 'appVersion must be a version such as "0.1.0" (letters, digits, ".", "+", "-"; at most 32 characters), got "<b>1</b>"'],
    ['keyResult a number', withField('keyResult', 3), 'keyResult must be an object such as { "lowestWetFrequencyHz": 1.84, "verdict": "clear" }, or absent, got 3'],
    ['frequency zero', withField('keyResult.lowestWetFrequencyHz', 0), 'keyResult.lowestWetFrequencyHz must be a finite number > 0 and at most 1000000 Hz, got 0'],
    ['frequency huge', withField('keyResult.lowestWetFrequencyHz', 1e308), 'keyResult.lowestWetFrequencyHz must be a finite number > 0 and at most 1000000 Hz, got 1e+308'],
    ['frequency a string', withField('keyResult.lowestWetFrequencyHz', '1.8'), 'keyResult.lowestWetFrequencyHz must be a finite number > 0 and at most 1000000 Hz, got "1.8"'],
    ['frequency NaN', withField('keyResult.lowestWetFrequencyHz', NaN), 'keyResult.lowestWetFrequencyHz must be a finite number > 0 and at most 1000000 Hz, got NaN'],
    ['verdict unknown', withField('keyResult.verdict', 'ok'), 'keyResult.verdict must be one of "clear", "close", "inside-band", got "ok"'],
  ];
  it.each(cases)('%s', (_label, raw, message) => {
    expect(messageOf(raw)).toBe(message);
  });

  it('names an odd input field in brackets so the message stays readable', () => {
    const raw = withField('inputs', { 'a.b-c': 5 });
    expect(messageOf(raw)).toBe('inputs["a.b-c"] must be a string such as "610 mm" of at most 200 characters, got 5');
  });

  it('checks the newer-version rule before any field, so a newer case with new fields gets the update message', () => {
    expect(messageOf({ format: 'wetmode-case', schemaVersion: 7, somethingNew: true })).toBe(NEWER_VERSION_MESSAGE);
  });
});

describe('parseCase never throws', () => {
  it('answers a throwing getter, a revoked proxy and odd primitives with a message', () => {
    const getter = { ...demoCase() };
    Object.defineProperty(getter, 'name', { enumerable: true, get: () => { throw new Error('boom'); } });
    const { proxy, revoke } = Proxy.revocable({}, {});
    revoke();
    const hostile: unknown[] = [getter, proxy, undefined, 10n, Symbol('s'), () => 1, new Map(), Number.NaN];
    for (const h of hostile) {
      let r: ReturnType<typeof parseCase> | undefined;
      expect(() => (r = parseCase(h))).not.toThrow();
      expect(r?.ok).toBe(false);
      expect(typeof (r as { message: string }).message).toBe('string');
    }
    expect(messageOf(getter)).toBe('this is not a usable case: it could not be read (boom)');
  });

  it('refuses a deeply nested value in an input with a short message, quickly', () => {
    let deep: unknown = '1 m';
    for (let i = 0; i < 100_000; i++) deep = { d: deep };
    const raw = { ...demoCase(), inputs: { length: deep } } as unknown as Case;
    expect(messageOf(raw)).toBe('inputs.length must be a string such as "610 mm" of at most 200 characters, got an object');
  });
});
