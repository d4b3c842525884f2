/** Names typed for Rename and Duplicate: the default for a copy, and the check before the store is asked. */
import { CASE_LIMITS, cutText } from '../../case';
import { displayName } from './format';

const COPY_SUFFIX = ' (copy)';

/** "<name> (copy)", shortened so the whole stays within the name limit. */
export function copyName(name: string): string {
  return cutText(displayName({ name }), CASE_LIMITS.nameChars - COPY_SUFFIX.length) + COPY_SUFFIX;
}

export type NameCheck = { ok: true; name: string } | { ok: false; message: string };

/**
 * A name as typed, trimmed at both ends. Empty is allowed (the list shows "Untitled"); a line break or more than
 * the schema's limit is refused with a message that says what was expected and what was got.
 */
export function checkCaseName(typed: string): NameCheck {
  const name = typed.trim();
  if (/[\r\n]/.test(name)) return { ok: false, message: 'A name must be one line; this one has a line break in it.' };
  // The schema's rule for one-line text (src/case/fields.ts): no control characters but tabs.
  if (/[\u0000-\u0008\u000B-\u001F\u007F]/.test(name)) {
    return { ok: false, message: 'A name must be plain text; this one has an invisible control character in it (pasted from another program?).' };
  }
  if (name.length > CASE_LIMITS.nameChars) {
    return { ok: false, message: `A name can have at most ${CASE_LIMITS.nameChars} characters; this one has ${name.length}.` };
  }
  return { ok: true, name };
}
