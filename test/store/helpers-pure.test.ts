import { afterEach, describe, expect, it, vi } from 'vitest';
import { parseCase, type Case } from '../../src/case';
import { estimateQuota, newCase, newCaseId, requestPersistence, searchCases, sortCases } from '../../src/store';
import { baffleCase, demoCase } from '../case/fixtures';
import { harness } from './helpers';

afterEach(() => vi.unstubAllGlobals());

const UUID_V4 = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

describe('new cases and ids', () => {
  it('newCaseId gives distinct version 4 UUIDs, with and without crypto.randomUUID', () => {
    const a = newCaseId();
    expect(a).toMatch(UUID_V4);
    // An insecure origin (plain http on a site network) has getRandomValues but no randomUUID.
    const real = globalThis.crypto;
    vi.stubGlobal('crypto', { getRandomValues: (b: Uint8Array<ArrayBuffer>) => real.getRandomValues(b) });
    const ids = new Set(Array.from({ length: 200 }, () => newCaseId()));
    expect(ids.size).toBe(200);
    for (const id of ids) expect(id).toMatch(UUID_V4);
  });

  it('newCase gives an empty case of the kind asked for, valid for parseCase', () => {
    const c = newCase({ kind: 'stem', unitSystem: 'us', name: 'Probe 3' });
    expect(parseCase(c)).toEqual({ ok: true, value: c });
    expect([c.kind, c.unitSystem, c.name, c.inputs, c.createdAt === c.updatedAt]).toEqual(['stem', 'us', 'Probe 3', {}, true]);
  });
});

describe('searchCases and sortCases', () => {
  const list: Case[] = [
    demoCase(),
    baffleCase(),
    { ...demoCase(), id: '00000000-0000-4000-8000-000000000010', name: 'Pile 10', tag: '', updatedAt: '2026-01-01T00:00:00Z' },
    { ...demoCase(), id: '00000000-0000-4000-8000-000000000009', name: 'Pile 9', tag: 'A-1', note: 'Übergang zone', updatedAt: '2026-06-01T00:00:00Z' },
  ];

  it('finds every word anywhere in name, tag, note or kind, ignoring case and accents', () => {
    expect(searchCases(list, 'berth b7').map((c) => c.name)).toEqual(['Pile B7 — east berth']);
    expect(searchCases(list, 'UBERGANG').map((c) => c.name)).toEqual(['Pile 9']);
    expect(searchCases(list, 'tank').map((c) => c.name)).toEqual(['Baffle 2, day tank']);
    expect(searchCases(list, 'grv-tk').map((c) => c.name)).toEqual(['Baffle 2, day tank']);
    expect(searchCases(list, '  ')).toHaveLength(4);
    expect(searchCases(list, 'riser')).toEqual([]);
  });

  it('sorts by last change, by name in natural order, by tag (empty last) and by kind, without changing the input', () => {
    const before = list.map((c) => c.id);
    expect(sortCases(list, 'updated').map((c) => c.name)).toEqual(['Pile 9', 'Baffle 2, day tank', 'Pile B7 — east berth', 'Pile 10']);
    expect(sortCases(list, 'name').map((c) => c.name)).toEqual(['Baffle 2, day tank', 'Pile 9', 'Pile 10', 'Pile B7 — east berth']);
    expect(sortCases(list, 'tag').map((c) => c.tag)).toEqual(['A-1', 'FH-JTY-B7', 'GRV-TK-02', '']);
    expect(sortCases(list, 'kind').map((c) => c.kind)).toEqual(['baffle', 'pile', 'pile', 'pile']);
    expect(list.map((c) => c.id)).toEqual(before);
  });
});

describe('persistent storage and quota', () => {
  it('requestPersistence answers granted, refused or unsupported', async () => {
    expect(await requestPersistence({ persisted: async () => true, persist: async () => false })).toBe('granted');
    expect(await requestPersistence({ persisted: async () => false, persist: async () => true })).toBe('granted');
    expect(await requestPersistence({ persist: async () => false })).toBe('refused');
    expect(await requestPersistence({ persist: async () => Promise.reject(new Error('no')) })).toBe('refused');
    expect(await requestPersistence({})).toBe('unsupported');
    expect(await requestPersistence(null)).toBe('unsupported');
  });

  it('estimateQuota reports usage and quota, or that the browser cannot say', async () => {
    expect(await estimateQuota({ estimate: async () => ({ usage: 2_000_000, quota: 8_000_000 }) })).toEqual({
      supported: true,
      usageBytes: 2_000_000,
      quotaBytes: 8_000_000,
      usedFraction: 0.25,
    });
    expect(await estimateQuota({ estimate: async () => ({}) })).toEqual({ supported: false });
    expect(await estimateQuota({ estimate: async () => Promise.reject(new Error('x')) })).toEqual({ supported: false });
    expect(await estimateQuota(undefined)).toEqual({ supported: false });
  });

  it('the store asks through the storage it was given', async () => {
    const persist = vi.fn(async () => true);
    const store = await harness().open({ storage: { persist, estimate: async () => ({ usage: 1, quota: 4 }) } });
    expect(await store.requestPersistence()).toBe('granted');
    expect(persist).toHaveBeenCalledTimes(1);
    expect(await store.estimateQuota()).toMatchObject({ supported: true, usedFraction: 0.25 });
  });
});
