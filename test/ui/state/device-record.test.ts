/**
 * The synchronous record of whether this device may hold cases or drafts, which lets the boot open the demo before
 * IndexedDB is open: fresh only with nothing kept, never after a save, a draft copy or a last open case, and never
 * when storage cannot be read.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { freshDevice, noteStoreHolds, resetNotedForTests } from '../../../src/ui/state/device-record';
import { writeFallback } from '../../../src/ui/state/draft-fallback';
import { rememberOpenCase } from '../../../src/ui/state/last-case';
import { caseFromDemo } from '../../../src/app/create-case';
import { DEMO_CASES } from '../../../src/kinds/registry';
import { memoryStorage } from '../../helpers/memory-storage';

/** A Storage that throws on every use, as a browser with site data blocked does. */
function blockedStorage(): Storage {
  const no = () => {
    throw new DOMException('The operation is insecure.', 'SecurityError');
  };
  return { get length(): number { return no(); }, key: no, getItem: no, setItem: no, removeItem: no, clear: no };
}

beforeEach(() => {
  resetNotedForTests();
  vi.stubGlobal('localStorage', memoryStorage());
  vi.stubGlobal('sessionStorage', memoryStorage());
});
afterEach(() => vi.unstubAllGlobals());

describe('the device record read before the store opens', () => {
  it('says fresh on a device that has kept nothing, even with unrelated settings stored', () => {
    localStorage.setItem('wetmode.theme', 'dark');
    localStorage.setItem('wetmode-last-request', '{}');
    expect(freshDevice()).toBe(true);
  });

  it('says not fresh once the store has been written to, and stays so', () => {
    noteStoreHolds();
    expect(freshDevice()).toBe(false);
    noteStoreHolds(); // a second write in the same page changes nothing
    expect(localStorage.getItem('wetmode.storeHolds')).toBe('1');
    expect(freshDevice()).toBe(false);
  });

  it('says not fresh when a closing tab left a copy of its draft', () => {
    writeFallback('tab-1', caseFromDemo(DEMO_CASES[0]), null, false);
    expect(freshDevice()).toBe(false);
  });

  it('says not fresh when a case was last open, on this device or in this tab only', () => {
    rememberOpenCase('00000000-0000-4000-8000-0000000000aa');
    expect(freshDevice()).toBe(false);
    localStorage.clear();
    expect(sessionStorage.getItem('wetmode.lastCase')).not.toBeNull();
    expect(freshDevice()).toBe(false);
  });

  it('counts a damaged record as a record: junk in the entry still says not fresh', () => {
    localStorage.setItem('wetmode.storeHolds', '{junk');
    expect(freshDevice()).toBe(false);
    localStorage.setItem('wetmode.storeHolds', '');
    expect(freshDevice()).toBe(false);
  });

  it('says not fresh, and never throws, when storage cannot be read or is missing', () => {
    vi.stubGlobal('localStorage', blockedStorage());
    expect(freshDevice()).toBe(false);
    expect(() => noteStoreHolds()).not.toThrow();
    vi.stubGlobal('localStorage', undefined);
    expect(freshDevice()).toBe(false);
    expect(() => noteStoreHolds()).not.toThrow();
  });

  it('a write that failed (storage full or blocked) is tried again on the next write', () => {
    const full = memoryStorage();
    let refuse = true;
    const setItem = full.setItem.bind(full);
    full.setItem = (k, v) => {
      if (refuse) throw new DOMException('full', 'QuotaExceededError');
      setItem(k, v);
    };
    vi.stubGlobal('localStorage', full);
    noteStoreHolds();
    expect(full.getItem('wetmode.storeHolds')).toBeNull();
    refuse = false;
    noteStoreHolds();
    expect(freshDevice()).toBe(false);
  });
});
