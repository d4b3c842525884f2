/** Pure helpers for the Cases screen: text search and sorting of a loaded list. */
import type { Case } from '../case';
import { kindOf } from '../kinds/registry';
import { fold, type CaseSort } from './list-record';

export type { CaseSort };

/**
 * Cases whose name, tag, note or member kind contain every word of `query` (any order, any case, accents ignored).
 * An empty query gives the list back unchanged.
 */
export function searchCases(cases: readonly Case[], query: string): Case[] {
  const words = fold(query).split(/\s+/).filter((w) => w.length > 0);
  if (words.length === 0) return cases.slice();
  return cases.filter((c) => {
    const hay = fold(`${c.name}\n${c.tag}\n${c.note}\n${kindOf(c.kind).searchWords}`);
    return words.every((w) => hay.includes(w));
  });
}

/** A sorted copy: 'updated' newest first; the others A to Z (natural order, so "Pile 9" before "Pile 10"), then newest. */
export function sortCases(cases: readonly Case[], by: CaseSort): Case[] {
  const collator = new Intl.Collator(undefined, { numeric: true, sensitivity: 'base' });
  const newest = (a: Case, b: Case) => Date.parse(b.updatedAt) - Date.parse(a.updatedAt);
  const text = (a: string, b: string) => (a === '' ? 1 : 0) - (b === '' ? 1 : 0) || collator.compare(a, b);
  const cmp: Record<CaseSort, (a: Case, b: Case) => number> = {
    updated: newest,
    name: (a, b) => text(a.name, b.name) || newest(a, b),
    tag: (a, b) => text(a.tag, b.tag) || newest(a, b),
    kind: (a, b) => collator.compare(a.kind, b.kind) || newest(a, b),
  };
  return cases.slice().sort(cmp[by]);
}
