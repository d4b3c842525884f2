/**
 * "Same case" for received links: what the user entered (name, tag, note, kind, units and every value as typed).
 * Times, the app version and the key result are left out: they change on save or are worked out from the rest.
 */
import type { Case, EnteredRanges, EnteredValues } from './types';

function sameValues(a: EnteredValues, b: EnteredValues): boolean {
  const ka = Object.keys(a);
  if (ka.length !== Object.keys(b).length) return false;
  // Field order does not matter: compare by name.
  return ka.every((k) => Object.prototype.hasOwnProperty.call(b, k) && a[k] === b[k]);
}

/** Ranges compare as entered; absent and empty are the same. */
function sameRanges(a: EnteredRanges | undefined, b: EnteredRanges | undefined): boolean {
  const flat = (r: EnteredRanges | undefined): EnteredValues =>
    Object.fromEntries(Object.entries(r ?? {}).map(([k, v]) => [k, JSON.stringify([v.low, v.high, v.on])]));
  return sameValues(flat(a), flat(b));
}

/** True when two cases hold the same entered content (ids are not compared: the caller decides on identity). */
export function sameCaseContent(a: Case, b: Case): boolean {
  return (
    a.name === b.name && a.tag === b.tag && a.note === b.note && a.kind === b.kind && a.unitSystem === b.unitSystem &&
    sameValues(a.inputs, b.inputs) && sameValues(a.excitation, b.excitation) && sameRanges(a.ranges, b.ranges) &&
    JSON.stringify(a.measurements ?? []) === JSON.stringify(b.measurements ?? [])
  );
}

/**
 * True when `copy` holds `original`'s entered content under a name made from it (as a received copy is named
 * "<name> (received <date>)"): the same tag, note, kind, units and values, and a name that starts with the original's.
 */
export function isRenamedCopy(copy: Case, original: Case): boolean {
  return sameCaseContent({ ...copy, name: original.name }, original) && copy.name.startsWith(original.name === '' ? 'Case' : original.name);
}
