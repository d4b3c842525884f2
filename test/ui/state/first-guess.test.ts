/**
 * The unsaved work the boot opens before the store is open: a reload takes its own copy written as the page went
 * away; a new tab the newest copy of a tab not open now; never a received case, or a copy that does not read as a case.
 */
import { describe, expect, it } from 'vitest';
import { guessFirstCase } from '../../../src/ui/state/first-guess';
import type { FallbackDraft } from '../../../src/ui/state/draft-fallback';
import { caseFromDemo } from '../../../src/app/create-case';
import { DEMO_CASES } from '../../../src/kinds/registry';

const pile = caseFromDemo(DEMO_CASES.find((d) => d.kind === 'pile')!);
const copy = (tab: string, name: string, savedAt: string, more: Partial<FallbackDraft> = {}): FallbackDraft => ({
  tab,
  case: { ...pile, id: `00000000-0000-4000-8000-${tab.padStart(12, '0')}`, name },
  savedAt,
  baseRevision: null,
  received: false,
  leaving: true,
  ...more,
});
const nameOf = (g: ReturnType<typeof guessFirstCase>) => g?.doc.name ?? null;

describe('the first case guessed before the store opens', () => {
  it('a reload takes its own copy, not a newer one of another tab', () => {
    const copies = [copy('1', 'mine', '2026-12-01T10:00:00Z', { baseRevision: 4 }), copy('2', 'other, newer', '2026-12-01T11:00:00Z')];
    const g = guessFirstCase(copies, { id: '1', fresh: false }, null);
    expect(nameOf(g)).toBe('mine');
    expect(g?.baseRevision).toBe(4);
    expect(guessFirstCase(copies, { id: '3', fresh: false }, null)).toBeNull();
  });

  it('a reload does not take its own copy written when the page was only hidden (its draft may be newer)', () => {
    expect(guessFirstCase([copy('1', 'hidden', '2026-12-01T10:00:00Z', { leaving: false })], { id: '1', fresh: false }, null)).toBeNull();
  });

  it('a new tab takes the newest copy of a tab not open now, however it was left, and none where open tabs cannot be told', () => {
    const copies = [copy('1', 'older', '2026-12-01T10:00:00Z'), copy('2', 'newer, hidden then closed', '2026-12-01T11:00:00Z', { leaving: false }), copy('4', 'newest, still open', '2026-12-01T12:00:00Z')];
    expect(nameOf(guessFirstCase(copies, { id: '9', fresh: true }, new Set(['4', '9'])))).toBe('newer, hidden then closed');
    expect(nameOf(guessFirstCase(copies, { id: '9', fresh: true }, new Set(['2', '4', '9'])))).toBe('older');
    expect(guessFirstCase(copies, { id: '9', fresh: true }, null)).toBeNull();
  });

  it('a received case, a copy that is not a case and a copy with a broken time are not guessed', () => {
    expect(guessFirstCase([copy('1', 'from a link', '2026-12-01T10:00:00Z', { received: true })], { id: '1', fresh: false }, null)).toBeNull();
    expect(guessFirstCase([{ ...copy('1', 'x', '2026-12-01T10:00:00Z'), case: { broken: true } }], { id: '1', fresh: false }, null)).toBeNull();
    expect(guessFirstCase([copy('1', 'x', 'not a time')], { id: '1', fresh: false }, null)).toBeNull();
    expect(guessFirstCase([], { id: '1', fresh: true }, new Set())).toBeNull();
  });
});
