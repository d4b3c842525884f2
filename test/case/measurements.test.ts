import { describe, expect, it } from 'vitest';
import { CASE_SCHEMA_VERSION, parseCase, type Case } from '../../src/case';
import { demoCase, measured } from './fixtures';

describe('measurements in a case (schema version 3)', () => {
  it('writes version 3', () => {
    expect(CASE_SCHEMA_VERSION).toBe(3);
  });

  it('opens a version 2 case unchanged but for its version, with no measurements, and says it migrated', () => {
    const current = demoCase();
    const r = parseCase({ ...current, schemaVersion: 2 });
    expect(r).toEqual({ ok: true, migratedFrom: 2, value: current });
    expect(r.ok && 'measurements' in r.value).toBe(false);
  });

  it('opens a version 1 case unchanged but for its version, through both steps', () => {
    const { ranges: _none, ...current } = demoCase();
    expect(parseCase({ ...current, schemaVersion: 1 })).toEqual({ ok: true, migratedFrom: 1, value: current });
  });

  it('keeps a version 3 case with measurements as it is, and it parses again without change', () => {
    const c: Case = { ...demoCase(), measurements: [measured(), measured({ id: '1c0f5d8b-2a3e-4f4c-9b7d-6e8fa0b1c2d4', takenAt: '2027-05-03T08:00:00.000Z', frequencyHz: 1.79, source: 'typed', note: '' })] };
    const r = parseCase(c);
    expect(r).toEqual({ ok: true, value: c });
  });

  it('fills the optional words of a measurement: who, where, water level, note and source', () => {
    const { by: _b, elevation: _e, waterLevel: _w, note: _n, source: _s, ...bare } = measured();
    const r = parseCase({ ...demoCase(), measurements: [bare] });
    if (!r.ok) throw new Error(r.message);
    expect(r.value.measurements?.[0]).toEqual({ ...measured(), by: '', elevation: '', waterLevel: '', note: '', source: 'typed' });
  });

  it('drops a raw motion record from a measurement: the case keeps only the frequency and the notes', () => {
    const withRecord = { ...measured(), record: { timesS: [0, 0.01, 0.02], accelerations: [[0.1, 0.2, 0.1]] } };
    const r = parseCase({ ...demoCase(), measurements: [withRecord] });
    if (!r.ok) throw new Error(r.message);
    expect(r.value.measurements).toEqual([measured()]);
  });

  it('refuses a measurement with a message naming the field, what was expected and what was got', () => {
    expect(parseCase({ ...demoCase(), measurements: [measured({ frequencyHz: -1 })] })).toEqual({
      ok: false,
      message: 'measurements.0.frequencyHz must be a finite number > 0 and at most 1000000 Hz, got -1',
    });
    expect(parseCase({ ...demoCase(), measurements: [measured({ uncertaintyHz: 2 })] })).toEqual({
      ok: false,
      message: 'measurements.0.uncertaintyHz must be a finite number ≥ 0 and below the frequency 1.84, got 2',
    });
    expect(parseCase({ ...demoCase(), measurements: [measured({ mode: 0 })] })).toEqual({
      ok: false,
      message: 'measurements.0.mode must be a whole number from 1 to 20, got 0',
    });
    expect(parseCase({ ...demoCase(), measurements: {} })).toEqual({ ok: false, message: 'measurements must be a list of measurements, got an object' });
  });
});
