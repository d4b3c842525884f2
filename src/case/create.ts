/**
 * A new, empty case. Pure: the caller gives the id (a UUID), the time and the app version,
 * so this stays free of clocks and random numbers (the app's `newCase` in src/store supplies them).
 */
import { CASE_FORMAT, CASE_SCHEMA_VERSION, type Case, type EnteredValues, type MemberKind, type UnitSystem } from './types';

export interface CaseInit {
  id: string;
  /** ISO 8601 time used for createdAt and updatedAt. */
  nowIso: string;
  appVersion: string;
  kind: MemberKind;
  unitSystem: UnitSystem;
  name?: string;
  tag?: string;
  note?: string;
  inputs?: EnteredValues;
  excitation?: EnteredValues;
}

export function createCase(init: CaseInit): Case {
  return {
    format: CASE_FORMAT,
    schemaVersion: CASE_SCHEMA_VERSION,
    id: init.id.toLowerCase(),
    name: init.name ?? '',
    tag: init.tag ?? '',
    note: init.note ?? '',
    kind: init.kind,
    unitSystem: init.unitSystem,
    inputs: { ...(init.inputs ?? {}) },
    excitation: { ...(init.excitation ?? {}) },
    createdAt: init.nowIso,
    updatedAt: init.nowIso,
    appVersion: init.appVersion,
  };
}
