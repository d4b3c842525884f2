/**
 * Words for importing a case file. Reading happens in the component (File.text()); the checks and messages
 * are here so they can be tested. The parse itself is `caseFromFileText` (src/share/file.ts).
 */
import type { Case, ParseCaseResult } from '../../case';
import { MAX_CASE_CHARS, MAX_EVIDENCE_CHARS } from '../../share/file';
import { formatBytes } from './format';
import { quoted, withStop } from './words';

/**
 * Largest file read at all. The case part has at most MAX_CASE_CHARS characters, and UTF-8 takes at most
 * 4 bytes for one; the site evidence is base64 and ASCII, one byte a character. Anything bigger is refused
 * before it is read into memory.
 */
export const MAX_IMPORT_BYTES = MAX_CASE_CHARS * 4 + MAX_EVIDENCE_CHARS;

/** The file's name for a message, shortened and in quotes. */
function fileLabel(fileName: string): string {
  const name = fileName.trim() === '' ? 'the file' : fileName.length > 60 ? `${fileName.slice(0, 57)}…` : fileName;
  return name === 'the file' ? name : `“${name}”`;
}

/** Null when a file of this size may be read; otherwise the message. */
export function importSizeProblem(fileName: string, sizeBytes: number): string | null {
  if (sizeBytes === 0) return `Could not open ${fileLabel(fileName)}: expected a Wetmode case file (.wetmode.json); got an empty file.`;
  if (sizeBytes > MAX_IMPORT_BYTES) {
    return `Could not open ${fileLabel(fileName)}: expected a Wetmode case file (.wetmode.json) of a few kB, up to about ${formatBytes(MAX_IMPORT_BYTES)} with site photos; got a file of ${formatBytes(sizeBytes)}.`;
  }
  return null;
}

export type ImportOutcome = { ok: true; value: Case; message: string } | { ok: false; message: string };

/** The result of `caseFromFileText` as what the user reads. */
export function importOutcome(fileName: string, parsed: ParseCaseResult): ImportOutcome {
  if (!parsed.ok) return { ok: false, message: `Could not open ${fileLabel(fileName)}: ${withStop(parsed.message)}` };
  const older =
    parsed.migratedFrom !== undefined
      ? ` It was made with an older Wetmode (case version ${parsed.migratedFrom}) and has been brought up to date.`
      : '';
  return {
    ok: true,
    value: parsed.value,
    message: `Opened ${quoted(parsed.value)} from ${fileLabel(fileName)}. It is not in your cases until you save it.${older}`,
  };
}

/** When the browser could not read the file at all (permissions, a file removed meanwhile). */
export function importReadProblem(fileName: string, error: unknown): string {
  const why = error instanceof Error && error.message ? ` (${error.message.slice(0, 160)})` : '';
  return `Could not open ${fileLabel(fileName)}: the browser could not read it${why}.`;
}
