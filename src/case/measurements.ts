/**
 * The `measurements` field of a case (schema version 3): measured natural frequencies of the member, each with
 * when, by whom or with what, where on the member and at what water level, as entered. A motion record the
 * frequency was read from stays on the device; the case (and so the link and the case file) keeps only the
 * frequency, its uncertainty, the mode it was taken as and the notes. Built fresh from checked values only.
 */
import { CaseFieldError, fail, isPlainObject, isoDateTime, oneOf, own, text, uuid } from './fields';

export const MEASUREMENT_SOURCES = ['typed', 'record'] as const;
export const MEASUREMENT_STATES = ['dry', 'wet'] as const;

/** One measured frequency. */
export interface CaseMeasurement {
  /** UUID, lower case. */
  id: string;
  /** ISO 8601 date and time of the measurement. */
  takenAt: string;
  /** Who or what measured it (free text, may be empty): "R. Okafor, clamped logger". */
  by: string;
  /** Elevation on the member as entered ("+2.5 m"); may be empty. */
  elevation: string;
  /** Water level at the time as entered; may be empty. */
  waterLevel: string;
  /** Measured frequency, Hz (finite, > 0). */
  frequencyHz: number;
  /** ± this, Hz (finite, ≥ 0, below the frequency). */
  uncertaintyHz: number;
  /** 1-based mode the frequency was taken as. */
  mode: number;
  state: (typeof MEASUREMENT_STATES)[number];
  /** Typed from a meter, or read from a motion record (the record itself stays on the device). */
  source: (typeof MEASUREMENT_SOURCES)[number];
  /** Free-text note; may be empty. */
  note: string;
}

export const MEASUREMENT_LIMITS = { count: 200, textChars: 200, noteChars: 1000, frequencyHzMax: 1e6, modeMax: 20 } as const;

function measurement(at: string, m: unknown): CaseMeasurement {
  if (!isPlainObject(m)) fail(at, 'an object { "takenAt", "frequencyHz", "uncertaintyHz", "mode", "state", ... }', m);
  const f = own(m, 'frequencyHz');
  if (typeof f !== 'number' || !Number.isFinite(f) || !(f > 0) || f > MEASUREMENT_LIMITS.frequencyHzMax) {
    fail(`${at}.frequencyHz`, `a finite number > 0 and at most ${MEASUREMENT_LIMITS.frequencyHzMax} Hz`, f);
  }
  const u = own(m, 'uncertaintyHz');
  if (typeof u !== 'number' || !Number.isFinite(u) || u < 0 || !(u < f)) fail(`${at}.uncertaintyHz`, `a finite number ≥ 0 and below the frequency ${f}`, u);
  const mode = own(m, 'mode');
  if (typeof mode !== 'number' || !Number.isInteger(mode) || mode < 1 || mode > MEASUREMENT_LIMITS.modeMax) {
    fail(`${at}.mode`, `a whole number from 1 to ${MEASUREMENT_LIMITS.modeMax}`, mode);
  }
  const line = { maxChars: MEASUREMENT_LIMITS.textChars };
  return {
    id: uuid(`${at}.id`, own(m, 'id')),
    takenAt: isoDateTime(`${at}.takenAt`, own(m, 'takenAt')),
    by: text(`${at}.by`, own(m, 'by') ?? '', line),
    elevation: text(`${at}.elevation`, own(m, 'elevation') ?? '', line),
    waterLevel: text(`${at}.waterLevel`, own(m, 'waterLevel') ?? '', line),
    frequencyHz: f,
    uncertaintyHz: u,
    mode,
    state: oneOf(`${at}.state`, own(m, 'state'), MEASUREMENT_STATES),
    source: oneOf(`${at}.source`, own(m, 'source') ?? 'typed', MEASUREMENT_SOURCES),
    note: text(`${at}.note`, own(m, 'note') ?? '', { maxChars: MEASUREMENT_LIMITS.noteChars, multiline: true }),
  };
}

/** Checks `measurements` (absent, null or empty: none). Throws CaseFieldError naming the field. */
export function caseMeasurements(field: string, value: unknown): CaseMeasurement[] | undefined {
  if (value === undefined || value === null) return undefined;
  if (!Array.isArray(value)) fail(field, 'a list of measurements', value);
  if (value.length > MEASUREMENT_LIMITS.count) throw new CaseFieldError(`${field} must hold at most ${MEASUREMENT_LIMITS.count} measurements, got ${value.length}`);
  const out = value.map((m, i) => measurement(`${field}.${i}`, m));
  return out.length > 0 ? out : undefined;
}
