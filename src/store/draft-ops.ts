/**
 * Drafts: the case each tab is editing, kept on every change so a closed tab, a reload, an update or a crash
 * loses nothing. One draft per tab and case (`TabDraftRecord`), so two tabs never overwrite each other's work;
 * a tab keeps one draft at a time (when it moves on to another case, the earlier draft is set aside, see
 * `setAsideTab`). Drafts of tabs that were closed stay until
 * they are opened again or discarded. A draft that cannot be read is listed (so it can be discarded) and is
 * never handed out as "the tab's draft": it can never stop the app from starting.
 */
import type { Draft, DraftList } from './api';
import { checkIncoming, failWith, inTx, type StoreContext, type Tx } from './context';
import { CASES, DRAFTS, draftKey, SET_ASIDE_TAB, type TabDraftRecord } from './db-schema';
import type { StoreResult } from './errors';
import { isPlainObject, parseCase, sameCaseContent, type Case } from '../case';

/** Reads a raw draft record: the draft, or why it cannot be read. */
function readDraft(raw: unknown): { ok: true; draft: Draft } | { ok: false; key: string; tab: string; message: string } {
  const rec = isPlainObject(raw) ? (raw as Partial<TabDraftRecord>) : {};
  const key = typeof rec.key === 'string' ? rec.key : '?';
  const tab = typeof rec.tab === 'string' ? rec.tab : '?';
  if (typeof rec.savedAt !== 'string') return { ok: false, key, tab, message: 'this kept draft is not in a form this Wetmode can read' };
  const r = parseCase(rec.case);
  if (!r.ok) return { ok: false, key, tab, message: `this kept draft cannot be read (${r.message})` };
  const base = typeof rec.baseRevision === 'number' && Number.isSafeInteger(rec.baseRevision) ? rec.baseRevision : null;
  const draft: Draft = { key, tab, case: r.value, savedAt: rec.savedAt, baseRevision: base };
  if (rec.received === true) draft.received = true;
  return { ok: true, draft };
}

async function allRecords(tx: Tx): Promise<unknown[]> {
  return (await tx.objectStore(DRAFTS).getAll()) as unknown[];
}

/** Deletes the drafts of `tab` other than `keep` (the user saved or chose to drop them). */
async function clearTab(tx: Tx, tab: string, keep: string | null): Promise<void> {
  for (const raw of await allRecords(tx)) {
    const rec = raw as Partial<TabDraftRecord>;
    if (rec.tab === tab && typeof rec.key === 'string' && rec.key !== keep) await tx.objectStore(DRAFTS).delete(rec.key);
  }
}

/**
 * A tab moving on to another case: its other drafts are set aside (kept under SET_ASIDE_TAB, offered on the Cases
 * screen) unless they hold nothing the saved case lacks. A case can replace the open one without the replace
 * guard (a link opened over unsaved work), so a draft is never dropped just because another was written.
 */
async function setAsideTab(tx: Tx, tab: string, keep: string): Promise<void> {
  const drafts = tx.objectStore(DRAFTS);
  for (const raw of await allRecords(tx)) {
    const rec = raw as Partial<TabDraftRecord>;
    if (rec.tab !== tab || typeof rec.key !== 'string' || rec.key === keep) continue;
    await drafts.delete(rec.key);
    const d = readDraft(raw);
    if (d.ok) {
      const saved = parseCase(await tx.objectStore(CASES).get(d.draft.case.id));
      if (saved.ok && sameCaseContent(saved.value, d.draft.case)) continue;
    }
    const caseId = typeof rec.caseId === 'string' ? rec.caseId : rec.key;
    await drafts.put({ ...(rec as TabDraftRecord), key: draftKey(SET_ASIDE_TAB, caseId), tab: SET_ASIDE_TAB });
  }
}

function record(tab: string, c: Case, savedAt: string, baseRevision: number | null, received = false): TabDraftRecord {
  const rec: TabDraftRecord = { key: draftKey(tab, c.id), tab, caseId: c.id, savedAt, baseRevision, case: c };
  if (received) rec.received = true;
  return rec;
}

export function saveDraft(ctx: StoreContext, draft: Case, baseRevision: number | null, received = false): Promise<StoreResult<Draft>> {
  const action = 'keep the draft';
  return inTx(ctx, action, [DRAFTS, CASES], 'readwrite', async (tx) => {
    const rec = record(ctx.tabId, checkIncoming(draft, action), ctx.now().toISOString(), baseRevision, received);
    await tx.objectStore(DRAFTS).put(rec);
    await setAsideTab(tx, ctx.tabId, rec.key);
    const out: Draft = { key: rec.key, tab: rec.tab, case: rec.case as Case, savedAt: rec.savedAt, baseRevision };
    if (received) out.received = true;
    return out;
  });
}

/**
 * Writes a draft kept elsewhere (the synchronous copy a tab leaves in localStorage as it closes) unless the
 * database already holds a newer one for the same tab and case. Resolves to true when it was written.
 */
export function mergeDraft(ctx: StoreContext, tab: string, draft: Case, savedAt: string, baseRevision: number | null, received = false): Promise<StoreResult<boolean>> {
  const action = 'keep the draft';
  return inTx(ctx, action, [DRAFTS, CASES], 'readwrite', async (tx) => {
    const rec = record(tab, checkIncoming(draft, action), savedAt, baseRevision, received);
    // Compared with every draft of that tab, not only the same case's: the tab may have moved on to another case
    // since this copy was written, and its newer draft must not be replaced by the older copy.
    for (const raw of await allRecords(tx)) {
      const old = readDraft(raw);
      if (old.ok && old.draft.tab === tab && Date.parse(old.draft.savedAt) >= Date.parse(savedAt)) return false;
    }
    await tx.objectStore(DRAFTS).put(rec);
    await setAsideTab(tx, tab, rec.key);
    return true;
  });
}

/** This tab's draft (readable ones only; the newest if several), or null. */
export function loadDraft(ctx: StoreContext): Promise<StoreResult<Draft | null>> {
  return inTx(ctx, 'load the draft', [DRAFTS], 'readonly', async (tx) => {
    let best: Draft | null = null;
    for (const raw of await allRecords(tx)) {
      const d = readDraft(raw);
      if (d.ok && d.draft.tab === ctx.tabId && (!best || Date.parse(d.draft.savedAt) > Date.parse(best.savedAt))) best = d.draft;
    }
    return best;
  });
}

/** Every draft, newest first, and those that cannot be read (listed so they can be discarded). */
export function listDrafts(ctx: StoreContext): Promise<StoreResult<DraftList>> {
  return inTx(ctx, 'list the drafts', [DRAFTS], 'readonly', async (tx) => {
    const out: DraftList = { drafts: [], unreadable: [] };
    for (const raw of await allRecords(tx)) {
      const d = readDraft(raw);
      if (d.ok) out.drafts.push(d.draft);
      else out.unreadable.push({ key: d.key, tab: d.tab, message: d.message });
    }
    out.drafts.sort((a, b) => Date.parse(b.savedAt) - Date.parse(a.savedAt));
    return out;
  });
}

/** Makes another (closed) tab's draft this tab's own, in one transaction: 'not-found' if another tab took it first. */
export function adoptDraft(ctx: StoreContext, key: string): Promise<StoreResult<Draft>> {
  const action = 'open the draft';
  return inTx(ctx, action, [DRAFTS, CASES], 'readwrite', async (tx) => {
    const store = tx.objectStore(DRAFTS);
    const raw: unknown = typeof key === 'string' ? await store.get(key) : undefined;
    if (raw === undefined) failWith('not-found', `Could not ${action}: it is no longer kept (opened in another tab, or discarded).`);
    const d = readDraft(raw);
    if (!d.ok) failWith('unreadable', `Could not ${action}: ${d.message}.`);
    await store.delete(key);
    const rec = record(ctx.tabId, d.draft.case, d.draft.savedAt, d.draft.baseRevision, d.draft.received === true);
    await store.put(rec);
    await setAsideTab(tx, ctx.tabId, rec.key);
    return { ...d.draft, key: rec.key, tab: ctx.tabId };
  });
}

/** Removes one draft (any tab's, readable or not). */
export function discardDraft(ctx: StoreContext, key: string): Promise<StoreResult<void>> {
  return inTx(ctx, 'discard the draft', [DRAFTS], 'readwrite', async (tx) => {
    if (typeof key === 'string') await tx.objectStore(DRAFTS).delete(key);
  });
}

/** Removes this tab's draft (after its case was saved, or when it was given up). */
export function clearDraft(ctx: StoreContext): Promise<StoreResult<void>> {
  return inTx(ctx, 'clear the draft', [DRAFTS], 'readwrite', (tx) => clearTab(tx, ctx.tabId, null));
}
