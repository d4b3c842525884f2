/**
 * Case files for export and import: `<name>.wetmode.json`, the full case (key result included) as
 * indented JSON in our own schema, readable by the app, the command line and a person. The site photos and
 * location kept on the device with the case travel beside it as an optional `siteEvidence` member
 * (site-evidence.ts), outside the case schema: the case itself, its link and its stored form are unchanged.
 */
import { NEWER_VERSION_MESSAGE, parseCase, type Case, type ParseCaseResult } from '../case';
import { MAX_FILE_PHOTOS, MAX_PHOTO_DATA_URL_CHARS, readSiteEvidence, type SiteEvidence } from './site-evidence';

export const CASE_FILE_EXTENSION = '.wetmode.json';
export const CASE_FILE_MIME = 'application/json';
/** The case itself is a few kB (1 000 000 characters is far beyond any); each photo adds its data URL and a few fields. */
export const MAX_CASE_CHARS = 1_000_000;
/** Characters of the site evidence at most: photo data URLs and their few fields (plain ASCII). */
export const MAX_EVIDENCE_CHARS = MAX_FILE_PHOTOS * (MAX_PHOTO_DATA_URL_CHARS + 200);
export const MAX_CASE_FILE_CHARS = MAX_CASE_CHARS + MAX_EVIDENCE_CHARS;

/** What a case file holds: the case, and the site evidence when the file carries any usable part of it. */
export type CaseFileResult = ParseCaseResult & {
  evidence?: SiteEvidence;
  /** Parts of the site evidence left out on import, one sentence each. */
  evidenceDropped?: string[];
};

/**
 * The file text for a case, with its site evidence when there is any (at most MAX_FILE_PHOTOS photos: the
 * caller says when more were left out). Throws a RangeError only if `c` does not pass parseCase (a programming error).
 */
export function caseToFileText(c: Case, evidence?: SiteEvidence): string {
  const checked = parseCase(c);
  if (!checked.ok) throw new RangeError(`caseToFileText: the case is not valid: ${checked.message}`);
  const has = evidence && (evidence.photos.length > 0 || evidence.location !== null);
  const body = has ? { ...checked.value, siteEvidence: { photos: evidence.photos.slice(0, MAX_FILE_PHOTOS), location: evidence.location } } : checked.value;
  return `${JSON.stringify(body, null, 2)}\n`;
}

/** Reads a case file's text. Never throws; the message says what is wrong in plain words. */
export function caseFromFileText(text: unknown): CaseFileResult {
  if (typeof text !== 'string') return { ok: false, message: 'this file could not be read as text' };
  if (text.length > MAX_CASE_FILE_CHARS) {
    return { ok: false, message: `this file is too large to be a Wetmode case (${text.length} characters; a case file has at most ${MAX_CASE_FILE_CHARS})` };
  }
  // A byte-order mark is left by some Windows editors.
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') return { ok: false, message: 'this file is empty' };
  let raw: unknown;
  try {
    raw = JSON.parse(body);
  } catch (e) {
    const why = e instanceof SyntaxError ? ` (${e.message.slice(0, 120)})` : '';
    return { ok: false, message: `this file is not a Wetmode case: it is not valid JSON${why}` };
  }
  // The site evidence is read on its own: a bad part of it is dropped and said, and never stops the case.
  let evidence: ReturnType<typeof readSiteEvidence> | null = null;
  if (typeof raw === 'object' && raw !== null && !Array.isArray(raw) && 'siteEvidence' in raw) {
    const { siteEvidence, ...rest } = raw as Record<string, unknown>;
    evidence = readSiteEvidence(siteEvidence);
    raw = rest;
  }
  const r = parseCase(raw);
  if (r.ok && evidence) {
    const kept = evidence.evidence.photos.length > 0 || evidence.evidence.location !== null;
    return { ...r, ...(kept ? { evidence: evidence.evidence } : {}), ...(evidence.dropped.length > 0 ? { evidenceDropped: evidence.dropped } : {}) };
  }
  if (r.ok || r.message === NEWER_VERSION_MESSAGE) return r;
  return { ok: false, message: `this file is not a usable Wetmode case: ${r.message}` };
}

/** A safe file name from the case name (or tag, or kind): "pile-b7-east-berth.wetmode.json". */
export function caseFileName(c: Case): string {
  const from = c.name || c.tag || c.kind;
  const slug = from
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60)
    .replace(/-+$/g, '');
  return `${slug || c.kind}${CASE_FILE_EXTENSION}`;
}
