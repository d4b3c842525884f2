/**
 * Pure formatting for the Cases screen: dates, byte counts, the storage line and one list row.
 * No DOM, no store: tested on their own (test/ui/cases).
 */
import type { Case, MemberKind, Verdict } from '../../case';
import { formatHz } from '../format/numbers';
import { kindOf } from '../../kinds/registry';

/** What a case without a name is called on screen (the stored name stays empty). */
export const UNTITLED = 'Untitled';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];

/**
 * An ISO time as the local date and 24-hour time: "1 Dec 2026, 14:05". Written out by hand rather than with
 * Intl so the list reads the same on every device and day-first (no 12/1 versus 1/12 doubt on a shared tablet).
 */
export function formatCaseDate(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return 'date unknown';
  const hh = String(d.getHours()).padStart(2, '0');
  const mm = String(d.getMinutes()).padStart(2, '0');
  return `${d.getDate()} ${MONTHS[d.getMonth()]} ${d.getFullYear()}, ${hh}:${mm}`;
}

/** Bytes in decimal units with one decimal from kB up: "512 B", "1.2 MB", "2.1 GB". */
export function formatBytes(bytes: number): string {
  if (!Number.isFinite(bytes) || bytes < 0) return 'an unknown amount';
  if (bytes < 1000) return `${Math.round(bytes)} B`;
  const units = ['kB', 'MB', 'GB', 'TB'];
  let v = bytes / 1000;
  let i = 0;
  // Move up a unit when rounding to one decimal would show 1000.0 of the smaller one.
  while (v >= 999.95 && i < units.length - 1) {
    v /= 1000;
    i++;
  }
  return `${v.toFixed(1)} ${units[i]}`;
}

/** Share of the quota above which the storage line warns. */
export const QUOTA_WARN_FRACTION = 0.8;

/** "Using 1.2 MB of 2.1 GB on this device", with a warning when nearly full; null when the browser cannot say. */
export function quotaWords(q: { supported: true; usageBytes: number; quotaBytes: number; usedFraction: number } | { supported: false }): string | null {
  if (!q.supported) return null;
  const line = `Using ${formatBytes(q.usageBytes)} of ${formatBytes(q.quotaBytes)} on this device`;
  if (q.usedFraction >= QUOTA_WARN_FRACTION) {
    return `${line} (${Math.round(q.usedFraction * 100)} % — nearly full: export and delete cases you no longer need)`;
  }
  return line;
}

/** "Pile", "Riser or conductor", … (the forms' titles). */
export function kindTitle(kind: MemberKind): string {
  return kindOf(kind).title;
}

/** The name to show: the case's own, or "Untitled" when it has none (blank names too). */
export function displayName(c: Pick<Case, 'name'>): string {
  return c.name.trim() === '' ? UNTITLED : c.name;
}

/** What one row of the saved list shows. Every text here is data: render it as text. */
export interface CaseRowView {
  id: string;
  name: string;
  kind: string;
  tag: string;
  updated: string;
  /** "1.23 Hz", or null when the case was saved without results. */
  frequency: string | null;
  verdict: Verdict | null;
  /** The verdict over the ranges on uncertain inputs, when one was kept. */
  bandVerdict: Verdict | null;
  /** The frequency, "not computed" when no result was kept, "not kept" when only a verdict was. */
  resultText: string;
}

/** Works on a full case or on a light list row (`CaseSummary`): both carry these fields. */
export function caseRowView(c: Pick<Case, 'id' | 'name' | 'kind' | 'tag' | 'updatedAt' | 'keyResult'>): CaseRowView {
  const f = c.keyResult?.lowestWetFrequencyHz;
  const frequency = typeof f === 'number' && Number.isFinite(f) && f > 0 ? formatHz(f) : null;
  const verdict = c.keyResult?.verdict ?? null;
  return {
    id: c.id,
    name: displayName(c),
    kind: kindTitle(c.kind),
    tag: c.tag,
    updated: formatCaseDate(c.updatedAt),
    frequency,
    verdict,
    bandVerdict: c.keyResult?.bandVerdict ?? null,
    resultText: frequency ?? (verdict === null ? 'not computed' : 'not kept'),
  };
}
