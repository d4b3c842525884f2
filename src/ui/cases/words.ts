/**
 * Messages of the Cases screen, the received-case banner and the share buttons, in plain words.
 * Pure: each is tested in test/ui/cases. Names quoted here are data; the components render them as text.
 */
import type { Case } from '../../case';
import type { ReceivedOutcome, SameCaseAnswer } from '../../store/api';
import type { PersistenceAnswer } from '../../store/persistence';
import type { CopyAnswer, ShareAnswer } from '../../share/share-sheet';
import { displayName, formatCaseDate } from './format';

/** Messages from the store and the link codec start in lower case to fit after "Could not …:"; alone, they need a capital and a full stop. */
export function sentence(message: string): string {
  const t = withStop(message);
  return t.charAt(0).toUpperCase() + t.slice(1);
}

/** The message trimmed and ending with a full stop (unless it already ends a sentence). */
export function withStop(message: string): string {
  const t = message.trim();
  return t === '' || /[.!?]$/.test(t) ? t : `${t}.`;
}

/** A case name in curly quotes for a message: “Pile P7”. */
export function quoted(c: Pick<Case, 'name'>): string {
  return `“${displayName(c)}”`;
}

/** What the received banner says about the device's copy (null: nothing to add). */
export function receivedStatusWords(answer: SameCaseAnswer): string | null {
  switch (answer.status) {
    case 'new':
      return null;
    case 'same':
      return `You already have this case unchanged in your cases (saved ${formatCaseDate(answer.saved.updatedAt)}).`;
    case 'changed':
      return answer.saved
        ? `You have another version of this case, ${quoted(answer.saved)} (saved ${formatCaseDate(answer.saved.updatedAt)}); saving keeps both.`
        : 'You have another version of this case, but that saved record cannot be read; saving keeps both.';
  }
}

/** After "Save to my cases". */
export function receivedOutcomeWords(outcome: ReceivedOutcome): string {
  switch (outcome.status) {
    case 'saved':
      return `Saved to your cases as ${quoted(outcome.case)}.`;
    case 'saved-copy':
      return `Saved as a copy: ${quoted(outcome.case)}. Your other version is kept as it was.`;
    case 'same':
      return `Already saved: ${quoted(outcome.case)} is in your cases unchanged.`;
  }
}

/** What the browser said when asked to keep Wetmode's storage. */
export function persistenceWords(answer: PersistenceAnswer): string {
  switch (answer) {
    case 'granted':
      return 'This browser will keep your saved cases even when the device runs short of space.';
    case 'refused':
      return 'This browser did not agree to keep your saved cases for good: it may clear them when the device runs short of space. Export important cases as files or copy their links.';
    case 'unsupported':
      return 'This browser cannot promise to keep saved cases when the device runs short of space. Export important cases as files or copy their links.';
  }
}

/**
 * Length above which a link may be cut by a text message or chat app. Common practice, no source: most chat apps
 * carry several thousand characters, but some SMS gateways and mail clients break long lines near 2,000.
 */
export const LONG_LINK_CHARS = 2000;

/** After "Copy link": says the length, and what to do when the clipboard refused. */
export function copyWords(answer: CopyAnswer, linkChars: number): string {
  const long = linkChars > LONG_LINK_CHARS ? ' It is long: some messaging apps may cut it, so send the case file if it does not open.' : '';
  switch (answer) {
    case 'copied':
      return `Link copied (${linkChars} characters).${long}`;
    case 'unsupported':
      return `This browser does not let Wetmode copy to the clipboard here. Select the link below (${linkChars} characters) and copy it by hand.${long}`;
    case 'failed':
      return `The browser refused to copy the link. Select the link below (${linkChars} characters) and copy it by hand.${long}`;
  }
}

/** After "Share…"; null when there is nothing to say (the user closed the sheet). */
export function shareWords(answer: ShareAnswer): string | null {
  switch (answer) {
    case 'shared':
      return 'Link shared.';
    case 'cancelled':
      return null;
    case 'unsupported':
      return 'This browser has no share sheet here. Use Copy link instead.';
    case 'failed':
      return 'The share sheet could not send the link. Use Copy link instead.';
  }
}

/** The status line after a delete (the Undo button sits beside it). */
export function deletedWords(c: Pick<Case, 'name'> | null): string {
  return c ? `Deleted ${quoted(c)}.` : 'Deleted the unreadable record.';
}

/** After Undo: the restored case, or null for an unreadable record put back. */
export function restoredWords(restored: Case | null, deletedName: string | null): string {
  if (restored === null) return 'The unreadable record is back in the list.';
  if (deletedName !== null && restored.name !== deletedName) {
    return `Restored as ${quoted(restored)}: another case has taken its place since, so both are kept.`;
  }
  return `Restored ${quoted(restored)}.`;
}

/** The line above the list: "12 saved cases", "3 of 12 saved cases match “pier”", or the empty state. */
export function listCountWords(shown: number, total: number, query: string): string {
  if (total === 0) return 'No saved cases on this device yet. Start a new case, open a demo or import a case file.';
  const noun = total === 1 ? 'saved case' : 'saved cases';
  return query.trim() === '' ? `${total} ${noun}` : `${shown} of ${total} ${noun} match “${query.trim()}”`;
}

/** Below a long list: how many rows are on screen out of those that match (the rest come with "Show more"). */
export function pageWords(onScreen: number, matched: number): string {
  return `Showing ${onScreen} of ${matched}.`;
}

/** When a search finds nothing. */
export function noMatchWords(query: string): string {
  return `No case matches “${query.trim()}”. Search looks for every word in names, tags, notes and member kinds; try fewer words.`;
}

/** Asked before another case replaces an open case with unsaved changes. */
export function replaceWarning(doc: Pick<Case, 'name'>, mode: 'editing' | 'received', everSaved: boolean): string {
  if (mode === 'received') return `The received case ${quoted(doc)} is open and not saved on this device. Opening another case closes it.`;
  return everSaved
    ? `The open case ${quoted(doc)} has changes that are not saved. Opening another case closes it.`
    : `The open case ${quoted(doc)} has not been saved yet. Opening another case closes it.`;
}
