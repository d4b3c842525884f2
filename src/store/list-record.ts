/**
 * The light list record kept beside every saved case (database version 4, store `list`), so the Cases screen
 * lists, searches and sorts without reading or parsing any full case. Each write of a case writes its list record
 * in the same transaction. Sort keys are stored ready-made so IndexedDB's own key order gives the screen's order:
 * `[text key, newest key]`, where the newest key is minus the change time in milliseconds (newest first).
 */
import { parseCase, type Case, type KeyResult, type MemberKind } from '../case';
import { kindOf } from '../kinds/registry';
import { storedRevision } from './stored-revision';

export type CaseSort = 'updated' | 'name' | 'tag' | 'kind';

/** One row of the saved list: what the list shows, plus its search text and sort keys. */
export interface CaseSummary {
  id: string;
  name: string;
  tag: string;
  kind: MemberKind;
  updatedAt: string;
  keyResult?: KeyResult;
  revision: number;
  /** Name, tag, note and the kind's words, folded (lower case, accents removed), one per line. */
  search: string;
  newest: number;
  byName: [string, number];
  byTag: [string, number];
  byKind: [string, number];
}

/** What is stored in `list`: a summary, or the key and reason of a record `parseCase` refuses. */
export type ListRecord = CaseSummary | { id: string; unreadable: string };

/** The index of `list` behind each sort (the updated sort uses the `newest` key path). */
export const SORT_INDEX: Record<CaseSort, string> = { updated: 'by-updated', name: 'by-name', tag: 'by-tag', kind: 'by-kind' };
export const LIST_INDEXES: readonly { name: string; keyPath: string }[] = [
  { name: 'by-updated', keyPath: 'newest' },
  { name: 'by-name', keyPath: 'byName' },
  { name: 'by-tag', keyPath: 'byTag' },
  { name: 'by-kind', keyPath: 'byKind' },
];

/** Case- and accent-insensitive text: "Übergang" is found by "uber". */
export function fold(s: string): string {
  return s.normalize('NFD').replace(/[\u0300-\u036f]/g, '').toLowerCase();
}

/** Sorts after every letter, so cases without a name or tag come last. */
const BLANK_LAST = '\uffff';

/**
 * A text sort key in natural order: folded, with each run of digits zero-padded to 16 places, so plain code-unit
 * order (IndexedDB's) puts "Pile 9" before "Pile 10". Blank text sorts last.
 */
export function naturalKey(s: string): string {
  if (s.trim() === '') return BLANK_LAST;
  return fold(s).replace(/\d+/g, (d) => d.replace(/^0+(?=\d)/, '').padStart(16, '0'));
}

/** Minus the time in ms (newest first in ascending key order); an unreadable time sorts last. */
function newestKey(iso: string): number {
  const t = Date.parse(iso);
  return Number.isFinite(t) ? -t : 0;
}

/** The summary of a readable case at `revision`. */
export function summaryOf(c: Case, revision: number): CaseSummary {
  const newest = newestKey(c.updatedAt);
  const s: CaseSummary = {
    id: c.id,
    name: c.name,
    tag: c.tag,
    kind: c.kind,
    updatedAt: c.updatedAt,
    revision,
    search: fold(`${c.name}\n${c.tag}\n${c.note}\n${kindOf(c.kind).searchWords}`),
    newest,
    byName: [naturalKey(c.name), newest],
    byTag: [naturalKey(c.tag), newest],
    byKind: [c.kind, newest],
  };
  if (c.keyResult) s.keyResult = c.keyResult;
  return s;
}

/** The list record for a stored case record as it is (readable or not) under `key`. */
export function listRecordOf(raw: unknown, key: string): ListRecord {
  const r = parseCase(raw);
  if (!r.ok) return { id: key, unreadable: `This saved case cannot be read: ${r.message}` };
  return summaryOf(r.value, storedRevision(raw));
}

export function isSummary(r: ListRecord): r is CaseSummary {
  return !('unreadable' in r);
}

function cmpKey(a: [string, number], b: [string, number]): number {
  return a[0] < b[0] ? -1 : a[0] > b[0] ? 1 : a[1] - b[1];
}

/** The same order as the sort's index, for placing a row back (undo) without reading the list again. */
export function compareSummaries(by: CaseSort): (a: CaseSummary, b: CaseSummary) => number {
  if (by === 'updated') return (a, b) => a.newest - b.newest;
  const field = by === 'name' ? 'byName' : by === 'tag' ? 'byTag' : 'byKind';
  return (a, b) => cmpKey(a[field], b[field]);
}

/** Rows whose search text contains every word of `query` (any order); an empty query keeps them all. */
export function searchSummaries(rows: readonly CaseSummary[], query: string): CaseSummary[] {
  const words = fold(query).split(/\s+/).filter((w) => w.length > 0);
  if (words.length === 0) return rows.slice();
  return rows.filter((r) => words.every((w) => r.search.includes(w)));
}
