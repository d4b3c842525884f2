/**
 * The case migration ladder. `CASE_STEPS[n]` turns a version-n object into a version-(n+1) object;
 * `parseCase` climbs from the stored version to `CASE_SCHEMA_VERSION` one step at a time and then
 * validates the result as version 1. A step checks only what it needs to move fields; the full
 * check happens once, at the top.
 *
 * Version 0 — the shape written by pre-release development builds (never by a released app). It is
 * kept so the ladder is exercised from the first release on:
 * ```
 * { format: 'wetmode-case', schemaVersion: 0,
 *   id: string,                       // UUID, as in version 1
 *   title: string,                    // -> name
 *   assetTag?: string,                // -> tag   (absent -> '')
 *   notes?: string,                   // -> note  (absent -> '')
 *   member: 'pile' | 'riser' | 'baffle' | 'sensor-stem',   // -> kind ('sensor-stem' -> 'stem')
 *   units: 'metric' | 'imperial',     // -> unitSystem ('si' | 'us')
 *   fields: Record<string, string>,   // -> inputs
 *   screening?: Record<string, string>, // -> excitation (absent -> {})
 *   savedAt: string,                  // -> createdAt and updatedAt (version 0 kept one time only)
 *   builtWith?: string }              // -> appVersion (absent in the earliest builds -> '0.0.0')
 * ```
 * Version 0 had no key result.
 *
 * Version 1 — as version 2 without `ranges` (ranges on uncertain inputs). Version 2 is version 1 plus an
 * optional `ranges` field, so a version-1 case opens unchanged; the version moved so that an older app, which
 * would silently drop the ranges, refuses a version-2 case instead ("made with a newer Wetmode").
 *
 * Version 2 — as version 3 without `measurements` (measured frequencies). Version 3 adds the optional
 * `measurements`; a version-2 case opens unchanged, and the version moved for the same reason as before.
 */
import { fail, oneOf, own } from './fields';
import { CASE_FORMAT, type MemberKind, type UnitSystem } from './types';

export type CaseStep = (raw: Record<string, unknown>) => Record<string, unknown>;

const V0_MEMBERS = ['pile', 'riser', 'baffle', 'sensor-stem'] as const;
const V0_UNITS = ['metric', 'imperial'] as const;

/** Version 0 -> 1: renamed fields, renamed words, one timestamp split into two. */
export function caseV0toV1(raw: Record<string, unknown>): Record<string, unknown> {
  const member = oneOf('member (version 0 case)', own(raw, 'member'), V0_MEMBERS);
  const units = oneOf('units (version 0 case)', own(raw, 'units'), V0_UNITS);
  const savedAt = own(raw, 'savedAt');
  if (typeof savedAt !== 'string') fail('savedAt (version 0 case)', 'a date and time in ISO 8601 form', savedAt);
  const kind: MemberKind = member === 'sensor-stem' ? 'stem' : member;
  const unitSystem: UnitSystem = units === 'metric' ? 'si' : 'us';
  return {
    format: CASE_FORMAT,
    schemaVersion: 1,
    id: own(raw, 'id'),
    name: own(raw, 'title'),
    tag: own(raw, 'assetTag') ?? '',
    note: own(raw, 'notes') ?? '',
    kind,
    unitSystem,
    inputs: own(raw, 'fields'),
    excitation: own(raw, 'screening') ?? {},
    createdAt: savedAt,
    updatedAt: savedAt,
    appVersion: own(raw, 'builtWith') ?? '0.0.0',
  };
}

/** Version 1 -> 2: nothing moves; version 2 only adds the optional `ranges`. */
export function caseV1toV2(raw: Record<string, unknown>): Record<string, unknown> {
  return { ...raw, schemaVersion: 2 };
}

/** Version 2 -> 3: nothing moves; version 3 only adds the optional `measurements` (none in an older case). */
export function caseV2toV3(raw: Record<string, unknown>): Record<string, unknown> {
  return { ...raw, schemaVersion: 3, measurements: [] };
}

/** The ladder: index n takes version n to n + 1. Its length is the current schema version. */
export const CASE_STEPS: readonly CaseStep[] = [caseV0toV1, caseV1toV2, caseV2toV3];
