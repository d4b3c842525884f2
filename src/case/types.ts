/**
 * The Wetmode case, schema version 3 (version 2 added `ranges`, version 3 `measurements`): one shape for the app, the device store, links, files and the command line.
 * Everything from outside (a record read back, a link, a file) reaches the app only through `parseCase`.
 * The schema is ours; its field list and limits are documented here and in `limits.ts`.
 */
import type { UnitSystem } from '../units/systems';
import type { Verdict } from '../physics/excitation/verdict';
import type { KindId as MemberKind } from '../kinds/registry-pure';
import type { CaseMeasurement } from './measurements';

export type { CaseMeasurement } from './measurements';

/** Value of `format` in every case; tells a Wetmode case from any other JSON. */
export const CASE_FORMAT = 'wetmode-case';

/** The schema version this build writes. Older versions are migrated step by step (`migrations.ts`). */
export const CASE_SCHEMA_VERSION = 3;

/** The member kinds a case may hold: the registry's ids (src/kinds/registry-pure.ts). */
export { KIND_IDS as MEMBER_KINDS, type KindId as MemberKind } from '../kinds/registry-pure';

// One declaration each: the unit systems belong to the units edge, the verdict words to the resonance screening.
export { UNIT_SYSTEMS, type UnitSystem } from '../units/systems';
export { VERDICTS, type Verdict } from '../physics/excitation/verdict';

/** Result figures kept with a saved case so the Cases list can show them without solving again. */
export interface KeyResult {
  /** Lowest wet natural frequency, Hz (finite, > 0). */
  lowestWetFrequencyHz?: number;
  verdict?: Verdict;
  /** The verdict over the band of the ranges on uncertain inputs, when ranges were on (schema version 2). */
  bandVerdict?: Verdict;
}

/**
 * Field values exactly as entered, units included: `{ outerDiameter: '610 mm', length: '24 m' }`.
 * Names: a letter, then letters, digits, `_`, `.` or `-` (at most 64 characters). Values: one line of text.
 * Whether a value makes sense for the field is the forms' check, not the schema's.
 */
export type EnteredValues = Record<string, string>;

/**
 * A range on one uncertain input, as entered: low and high in the field's unit entry ("3.5 m", "50"), and
 * whether it is used. Keys are member field names, as in `inputs`.
 */
export interface EnteredRange {
  low: string;
  high: string;
  on: boolean;
}

export type EnteredRanges = Record<string, EnteredRange>;

/** A saved, shared or exported case (schema version 3). */
export interface Case {
  format: typeof CASE_FORMAT;
  schemaVersion: typeof CASE_SCHEMA_VERSION;
  /** UUID, lower case; stays with the case through links and files so the same case is recognised. */
  id: string;
  /** Free text; may be empty. Always data, never markup: show it as text. */
  name: string;
  /** Site or asset tag; may be empty. */
  tag: string;
  /** Free-text note; may be empty; the only field that may hold line breaks. */
  note: string;
  kind: MemberKind;
  unitSystem: UnitSystem;
  /** Member inputs as entered. */
  inputs: EnteredValues;
  /** Resonance-screening inputs as entered; may be empty. */
  excitation: EnteredValues;
  /** Ranges on uncertain member inputs as entered (absent: none). */
  ranges?: EnteredRanges;
  /** Measured frequencies of the member, oldest first as entered (absent: none). Schema version 3. */
  measurements?: CaseMeasurement[];
  /** ISO 8601 date and time, e.g. "2026-03-14T09:21:05.123Z". */
  createdAt: string;
  /** ISO 8601 date and time of the last change. */
  updatedAt: string;
  /** Version of the Wetmode that last wrote the case, e.g. "0.1.0". */
  appVersion: string;
  keyResult?: KeyResult;
}

/** Result of `parseCase`: a whole, valid case (maybe migrated from an older version), or a reason in plain words. */
export type ParseCaseResult =
  | { ok: true; value: Case; migratedFrom?: number }
  | { ok: false; message: string };

/** Exactly what a surveyor sees when a case comes from a newer app than this one. */
export const NEWER_VERSION_MESSAGE = 'made with a newer Wetmode: update the app to open it';
