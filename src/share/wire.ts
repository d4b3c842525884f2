/**
 * The case as it travels in a link ("wire form", case schema 1): a JSON array by position rather than an object,
 * which keeps about 80 characters of field names out of every link.
 *
 *   [schemaVersion, id, name, tag, note, kind, unitSystem, inputs, excitation, createdAt, updatedAt, appVersion]
 *
 * Case schema 2 adds the ranges as a 13th element (an empty object when there are none); links written in the
 * schema-1 layout (12 elements) still open.
 *
 * Case schema 3 adds the measured frequencies as a 14th element: per measurement
 *   [id, takenAt, by, elevation, waterLevel, frequencyHz, uncertaintyHz, mode, state, source, note]
 * The motion record a frequency was read from never travels: it stays on the device that recorded it.
 *
 * Left out: `format` (implied by the link) and `keyResult` (the receiving app works the results out again, from
 * its own physics). The id travels so a received case can be recognised as one already saved.
 * A future case schema gets its own layout, told apart by the first element.
 */
import { CASE_FORMAT, CASE_SCHEMA_VERSION, NEWER_VERSION_MESSAGE, parseCase, type Case, type ParseCaseResult } from '../case';

export const WIRE_LENGTH_V1 = 12;
export const WIRE_LENGTH_V2 = 13;
export const WIRE_LENGTH_V3 = 14;

function measurementsToWire(c: Case): unknown[] {
  return (c.measurements ?? []).map((m) => [m.id, m.takenAt, m.by, m.elevation, m.waterLevel, m.frequencyHz, m.uncertaintyHz, m.mode, m.state, m.source, m.note]);
}

function measurementsFromWire(w: unknown): unknown {
  if (!Array.isArray(w)) return w;
  return w.map((m) => {
    if (!Array.isArray(m) || m.length !== 11) return m;
    const [id, takenAt, by, elevation, waterLevel, frequencyHz, uncertaintyHz, mode, state, source, note] = m;
    return { id, takenAt, by, elevation, waterLevel, frequencyHz, uncertaintyHz, mode, state, source, note };
  });
}

export function caseToWire(c: Case): unknown[] {
  return [c.schemaVersion, c.id, c.name, c.tag, c.note, c.kind, c.unitSystem, c.inputs, c.excitation, c.createdAt, c.updatedAt, c.appVersion, c.ranges ?? {}, measurementsToWire(c)];
}

/** What a case looks like after a trip through a link: the same, less `keyResult`. */
export function linkView(c: Case): Case {
  const { keyResult: _dropped, ...rest } = c;
  return rest;
}

/** Wire form back to a case, through parseCase. Never throws. */
export function wireToCase(wire: unknown): ParseCaseResult {
  if (!Array.isArray(wire) || wire.length === 0) {
    return { ok: false, message: 'it does not hold a case in the form Wetmode writes' };
  }
  const version = wire[0];
  if (typeof version === 'number' && Number.isInteger(version) && version > CASE_SCHEMA_VERSION) return { ok: false, message: NEWER_VERSION_MESSAGE };
  if (!((version === 1 && wire.length === WIRE_LENGTH_V1) || (version === 2 && wire.length === WIRE_LENGTH_V2) || (version === 3 && wire.length === WIRE_LENGTH_V3))) {
    return { ok: false, message: 'it does not hold a case in the form Wetmode writes' };
  }
  const [schemaVersion, id, name, tag, note, kind, unitSystem, inputs, excitation, createdAt, updatedAt, appVersion, ranges, measurements] = wire;
  return parseCase({ format: CASE_FORMAT, schemaVersion, id, name, tag, note, kind, unitSystem, inputs, excitation, createdAt, updatedAt, appVersion, ranges, measurements: measurementsFromWire(measurements) });
}
