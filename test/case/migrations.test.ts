import { describe, expect, it } from 'vitest';
import { CASE_SCHEMA_VERSION, CASE_STEPS, parseCase } from '../../src/case';
import { demoCase, v0Case } from './fixtures';

describe('case migration ladder', () => {
  it('has one step per past version, so every version up to the current one can climb', () => {
    expect(CASE_STEPS.length).toBe(CASE_SCHEMA_VERSION);
  });

  it('migrates a version 0 case to the current version, field by field, and says it did', () => {
    expect(parseCase(v0Case())).toEqual({
      ok: true,
      migratedFrom: 0,
      value: {
        format: 'wetmode-case',
        schemaVersion: 3,
        id: '5a1e7c3b-2d94-4f60-8e1a-7b3c9d2e4f50',
        name: 'Level probe, settling tank',
        tag: 'GRV-LT-11',
        note: 'From an early build.\nSecond line.',
        kind: 'stem',
        unitSystem: 'us',
        inputs: { insertionLength: '12 in', outerDiameter: '1 in' },
        excitation: { flowSpeed: '3 ft/s' },
        createdAt: '2025-11-20T08:30:00Z',
        updatedAt: '2025-11-20T08:30:00Z',
        appVersion: '0.0.9',
      },
    });
  });

  it('fills the fields version 0 could leave out: tag, note, screening and the builder version', () => {
    const { assetTag: _a, notes: _n, screening: _s, builtWith: _b, ...bare } = v0Case();
    const r = parseCase({ ...bare, member: 'pile', units: 'metric' });
    if (!r.ok) throw new Error(r.message);
    expect([r.value.tag, r.value.note, r.value.excitation, r.value.appVersion, r.value.kind, r.value.unitSystem]).toEqual(['', '', {}, '0.0.0', 'pile', 'si']);
  });

  it('names version 0 fields in its own messages', () => {
    expect(parseCase({ ...v0Case(), member: 'tower' })).toEqual({
      ok: false,
      message: 'member (version 0 case) must be one of "pile", "riser", "baffle", "sensor-stem", got "tower"',
    });
    expect(parseCase({ ...v0Case(), units: 'si' })).toEqual({ ok: false, message: 'units (version 0 case) must be "metric" or "imperial", got "si"' });
    expect(parseCase({ ...v0Case(), savedAt: 5 })).toEqual({ ok: false, message: 'savedAt (version 0 case) must be a date and time in ISO 8601 form, got 5' });
  });

  it('says a failure came from a migrated case, after the check of the current version', () => {
    expect(parseCase({ ...v0Case(), title: 12 })).toEqual({
      ok: false,
      message: 'name must be a string of at most 200 characters, got 12 (in a version 0 case, after updating it to version 3)',
    });
  });

  it('a migrated case parses again as a current case with no migration', () => {
    const once = parseCase(v0Case());
    if (!once.ok) throw new Error(once.message);
    expect(parseCase(once.value)).toEqual({ ok: true, value: once.value });
  });

  it('opens a version 1 case unchanged except for its version, with no ranges, and says it migrated', () => {
    const { ranges: _none, ...v2 } = demoCase();
    const r = parseCase({ ...v2, schemaVersion: 1 });
    expect(r).toEqual({ ok: true, migratedFrom: 1, value: v2 });
  });

  it('drops ranges from a version 1 case only by keeping them: a version 1 record with ranges keeps them after the climb', () => {
    // Version 1 never wrote ranges; a hand-edited one that has them is read as version 2 would read it.
    const ranges = { fixityDepth: { low: '2.1', high: '4.9', on: true } };
    const r = parseCase({ ...demoCase(), schemaVersion: 1, ranges });
    if (!r.ok) throw new Error(r.message);
    expect(r.value.ranges).toEqual(ranges);
  });

  it('keeps ranges as entered in a version 2 case and refuses a range that is not { low, high, on }', () => {
    const ranges = { fixityDepth: { low: '2.1', high: '4.9 m', on: false }, growthThickness: { low: '0', high: '100', on: true } };
    const r = parseCase({ ...demoCase(), ranges });
    if (!r.ok) throw new Error(r.message);
    expect(r.value.ranges).toEqual(ranges);
    expect(parseCase({ ...demoCase(), ranges: { fixityDepth: { low: 2.1, high: '4.9', on: true } } })).toEqual({
      ok: false,
      message: 'ranges.fixityDepth.low must be a string such as "2.1 m" of at most 200 characters, got 2.1',
    });
    expect(parseCase({ ...demoCase(), ranges: { fixityDepth: { low: '2', high: '4', on: 'yes' } } })).toEqual({
      ok: false,
      message: 'ranges.fixityDepth.on must be true or false, got "yes"',
    });
  });

  it('keeps the verdict over the band with the key result, and refuses a word that is not a verdict', () => {
    const r = parseCase({ ...demoCase(), keyResult: { lowestWetFrequencyHz: 1.8, verdict: 'close', bandVerdict: 'inside-band' } });
    if (!r.ok) throw new Error(r.message);
    expect(r.value.keyResult).toEqual({ lowestWetFrequencyHz: 1.8, verdict: 'close', bandVerdict: 'inside-band' });
    expect(parseCase({ ...demoCase(), keyResult: { bandVerdict: 'fine' } })).toEqual({
      ok: false,
      message: 'keyResult.bandVerdict must be one of "clear", "close", "inside-band", got "fine"',
    });
  });

  it('climbs a version 0 case through every step to the current version', () => {
    const r = parseCase(v0Case());
    if (!r.ok) throw new Error(r.message);
    expect(r.value.schemaVersion).toBe(CASE_SCHEMA_VERSION);
    expect(r.migratedFrom).toBe(0);
  });
});
