/** The synchronous localStorage copy of a tab's draft: written, read back by any tab, damaged entries removed. */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DEMO_CASES } from '../../src/kinds/registry';
import { clearFallback, readFallbacks, writeFallback } from '../../src/ui/state/draft-fallback';
import { caseFromDemo } from '../../src/app/create-case';
import { memoryStorage } from '../helpers/memory-storage';

afterEach(() => vi.unstubAllGlobals());

describe('the localStorage copy of a draft', () => {
  it('is written per tab, read back with its revision and mode, and cleared', () => {
    vi.stubGlobal('localStorage', memoryStorage());
    const doc = caseFromDemo(DEMO_CASES[0]);
    writeFallback('tab-1', doc, 3, false);
    writeFallback('tab-2', { ...doc, name: 'received' }, null, true, true);
    localStorage.setItem('wetmode.theme', 'dark');
    const read = readFallbacks().sort((a, b) => a.tab.localeCompare(b.tab));
    expect(read.map((f) => [f.tab, (f.case as { name: string }).name, f.baseRevision, f.received, f.leaving])).toEqual([
      ['tab-1', doc.name, 3, false, false],
      ['tab-2', 'received', null, true, true],
    ]);
    clearFallback('tab-1');
    expect(readFallbacks().map((f) => f.tab)).toEqual(['tab-2']);
    expect(localStorage.getItem('wetmode.theme')).toBe('dark');
  });

  it('a damaged entry is removed, and missing storage is no error', () => {
    vi.stubGlobal('localStorage', memoryStorage());
    localStorage.setItem('wetmode.draft.x', '{not json');
    expect(readFallbacks()).toEqual([]);
    expect(localStorage.getItem('wetmode.draft.x')).toBeNull();
    vi.stubGlobal('localStorage', undefined);
    expect(() => writeFallback('t', caseFromDemo(DEMO_CASES[0]), null, false)).not.toThrow();
    expect(readFallbacks()).toEqual([]);
  });
});
