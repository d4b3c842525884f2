/**
 * Case files for export and import: `<name>.wetmode.json`, the full case (key result included) as
 * indented JSON in our own schema, readable by the app, the command line and a person.
 */
import { NEWER_VERSION_MESSAGE, parseCase, type Case, type ParseCaseResult } from '../case';

export const CASE_FILE_EXTENSION = '.wetmode.json';
export const CASE_FILE_MIME = 'application/json';
/** A real case file is a few kB; anything far larger is not one. */
export const MAX_CASE_FILE_CHARS = 1_000_000;

/** The file text for a case. Throws a RangeError only if `c` does not pass parseCase (a programming error). */
export function caseToFileText(c: Case): string {
  const checked = parseCase(c);
  if (!checked.ok) throw new RangeError(`caseToFileText: the case is not valid: ${checked.message}`);
  return `${JSON.stringify(checked.value, null, 2)}\n`;
}

/** Reads a case file's text. Never throws; the message says what is wrong in plain words. */
export function caseFromFileText(text: unknown): ParseCaseResult {
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
  const r = parseCase(raw);
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
