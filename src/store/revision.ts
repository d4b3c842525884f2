/**
 * Revisions of saved cases. Every write of a case record stores `revision` beside the case fields (1 when first
 * written, one more on each change), so a save based on an older revision is noticed instead of overwriting.
 * `parseCase` drops the extra field, so each case object the store hands out is remembered here with the
 * revision it was read or written at; `revisionOf(c)` gives it back.
 */
import type { Case } from '../case';
import { REVISION_FIELD, storedRevision } from './db-schema';

const known = new WeakMap<Case, number>();

/** The revision a case object had when the store handed it out; null for a case that did not come from the store. */
export function revisionOf(c: Case): number | null {
  return known.get(c) ?? null;
}

/** Remembers `c` as read at `revision`; returns `c`. */
export function stamp(c: Case, revision: number): Case {
  known.set(c, revision);
  return c;
}

/** Remembers `c` with the revision of the raw record it was read from. */
export function stampFrom(c: Case, raw: unknown): Case {
  return stamp(c, storedRevision(raw));
}

/** The record to store for `c` at `revision`. */
export function toRecord(c: Case, revision: number): Case & { [REVISION_FIELD]: number } {
  return { ...c, [REVISION_FIELD]: revision };
}
