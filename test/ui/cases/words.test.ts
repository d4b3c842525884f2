import { describe, expect, it } from 'vitest';
import type { Case } from '../../../src/case';
import {
  LONG_LINK_CHARS,
  copyWords,
  deletedWords,
  listCountWords,
  noMatchWords,
  persistenceWords,
  receivedOutcomeWords,
  receivedStatusWords,
  replaceWarning,
  restoredWords,
  sentence,
  shareWords,
  withStop,
} from '../../../src/ui/cases/words';
import { formatCaseDate } from '../../../src/ui/cases/format';
import { demoCase } from '../../case/fixtures';

const saved: Case = { ...demoCase(), name: 'Pile B7', updatedAt: '2026-11-30T08:15:00.000Z' };

describe('store and link messages shown on their own', () => {
  it('start with a capital and end with a full stop, without doubling one', () => {
    expect(sentence('this link is damaged — ask the sender to copy it again')).toBe('This link is damaged — ask the sender to copy it again.');
    expect(sentence('Could not save the case: storage is full.')).toBe('Could not save the case: storage is full.');
    expect(sentence('  made with a newer Wetmode: update the app to open it ')).toBe('Made with a newer Wetmode: update the app to open it.');
    expect(withStop('what went wrong?')).toBe('what went wrong?');
    expect(sentence('')).toBe('');
  });
});

describe('the received banner', () => {
  it('says nothing more for a case this device has never seen', () => {
    expect(receivedStatusWords({ status: 'new' })).toBeNull();
  });
  it('says when the device already has the case unchanged, and since when', () => {
    expect(receivedStatusWords({ status: 'same', saved })).toBe(
      `You already have this case unchanged in your cases (saved ${formatCaseDate(saved.updatedAt)}).`,
    );
  });
  it('says that saving a changed version keeps both, naming the saved one', () => {
    expect(receivedStatusWords({ status: 'changed', saved })).toBe(
      `You have another version of this case, “Pile B7” (saved ${formatCaseDate(saved.updatedAt)}); saving keeps both.`,
    );
    expect(receivedStatusWords({ status: 'changed', saved: null })).toBe(
      'You have another version of this case, but that saved record cannot be read; saving keeps both.',
    );
  });
  it('words each outcome of Save to my cases', () => {
    expect(receivedOutcomeWords({ status: 'saved', case: saved })).toBe('Saved to your cases as “Pile B7”.');
    expect(receivedOutcomeWords({ status: 'saved-copy', case: { ...saved, name: 'Pile B7 (received 2026-12-01)' } })).toBe(
      'Saved as a copy: “Pile B7 (received 2026-12-01)”. Your other version is kept as it was.',
    );
    expect(receivedOutcomeWords({ status: 'same', case: saved })).toBe('Already saved: “Pile B7” is in your cases unchanged.');
  });
  it('calls an unnamed received case "Untitled"', () => {
    expect(receivedOutcomeWords({ status: 'saved', case: { ...saved, name: '' } })).toBe('Saved to your cases as “Untitled”.');
  });
});

describe('persistent storage', () => {
  it('says plainly whether the browser will keep the cases, and what to do if not', () => {
    expect(persistenceWords('granted')).toMatch(/^This browser will keep your saved cases/);
    expect(persistenceWords('refused')).toMatch(/may clear them .* Export important cases as files/);
    expect(persistenceWords('unsupported')).toMatch(/cannot promise .* Export important cases as files/);
  });
});

describe('copy and share', () => {
  it('gives the link length when copied', () => {
    expect(copyWords('copied', 562)).toBe('Link copied (562 characters).');
  });
  it('asks for a copy by hand when the clipboard is refused or missing', () => {
    expect(copyWords('failed', 562)).toBe('The browser refused to copy the link. Select the link below (562 characters) and copy it by hand.');
    expect(copyWords('unsupported', 562)).toMatch(/^This browser does not let Wetmode copy to the clipboard here\. Select the link below/);
  });
  it('warns about a link long enough for a messaging app to cut', () => {
    expect(copyWords('copied', LONG_LINK_CHARS)).toBe(`Link copied (${LONG_LINK_CHARS} characters).`);
    expect(copyWords('copied', LONG_LINK_CHARS + 1)).toMatch(/It is long: some messaging apps may cut it, so send the case file/);
  });
  it('says nothing when the user closes the share sheet, and points to Copy link when sharing fails', () => {
    expect(shareWords('cancelled')).toBeNull();
    expect(shareWords('shared')).toBe('Link shared.');
    expect(shareWords('failed')).toMatch(/Use Copy link instead\.$/);
    expect(shareWords('unsupported')).toMatch(/Use Copy link instead\.$/);
  });
});

describe('delete and undo', () => {
  it('names the deleted case, or the unreadable record', () => {
    expect(deletedWords(saved)).toBe('Deleted “Pile B7”.');
    expect(deletedWords(null)).toBe('Deleted the unreadable record.');
  });
  it('says when a restored case came back under another name because its place was taken', () => {
    expect(restoredWords(saved, 'Pile B7')).toBe('Restored “Pile B7”.');
    expect(restoredWords({ ...saved, name: 'Pile B7 (restored)' }, 'Pile B7')).toBe(
      'Restored as “Pile B7 (restored)”: another case has taken its place since, so both are kept.',
    );
    expect(restoredWords(null, null)).toBe('The unreadable record is back in the list.');
  });
});

describe('the list line and search', () => {
  it('counts the cases, and the matches while searching', () => {
    expect(listCountWords(1, 1, '')).toBe('1 saved case');
    expect(listCountWords(12, 12, '  ')).toBe('12 saved cases');
    expect(listCountWords(3, 12, ' pier ')).toBe('3 of 12 saved cases match “pier”');
  });
  it('says what to do when there are no cases yet, or no match', () => {
    expect(listCountWords(0, 0, '')).toBe('No saved cases on this device yet. Start a new case, open a demo or import a case file.');
    expect(noMatchWords('berth 9 ')).toBe('No case matches “berth 9”. Search looks for every word in names, tags, notes and member kinds; try fewer words.');
  });
});

describe('before another case replaces the open one', () => {
  it('says what would be lost, for an edited and for a received case', () => {
    expect(replaceWarning(saved, 'editing', true)).toBe('The open case “Pile B7” has changes that are not saved. Opening another case closes it.');
    expect(replaceWarning(saved, 'editing', false)).toBe('The open case “Pile B7” has not been saved yet. Opening another case closes it.');
    expect(replaceWarning(saved, 'received', false)).toBe('The received case “Pile B7” is open and not saved on this device. Opening another case closes it.');
  });
});
