/** The draft: the one case being edited, kept on every change so a closed tab, an update or a crash loses nothing. */
import type { Draft } from './api';
import { checkIncoming, failWith, inTx, type StoreContext } from './context';
import { DRAFT, DRAFT_KEY, type DraftRecord } from './db-schema';
import type { StoreResult } from './errors';
import { isPlainObject, parseCase, type Case } from '../case';

export function saveDraft(ctx: StoreContext, draft: Case): Promise<StoreResult<Draft>> {
  const action = 'keep the draft';
  return inTx(ctx, action, [DRAFT], 'readwrite', async (tx) => {
    const record = { savedAt: ctx.now().toISOString(), case: checkIncoming(draft, action) };
    await tx.objectStore(DRAFT).put(record satisfies DraftRecord, DRAFT_KEY);
    return record;
  });
}

export function loadDraft(ctx: StoreContext): Promise<StoreResult<Draft | null>> {
  const action = 'load the draft';
  return inTx(ctx, action, [DRAFT], 'readonly', async (tx) => {
    const raw: unknown = await tx.objectStore(DRAFT).get(DRAFT_KEY);
    if (raw === undefined) return null;
    if (!isPlainObject(raw) || typeof raw.savedAt !== 'string') {
      failWith('unreadable', `Could not ${action}: the kept draft is not in a form this Wetmode can read.`);
    }
    const r = parseCase(raw.case);
    if (!r.ok) failWith('unreadable', `Could not ${action}: the kept draft cannot be read (${r.message}).`);
    return { case: r.value, savedAt: raw.savedAt };
  });
}

export function clearDraft(ctx: StoreContext): Promise<StoreResult<void>> {
  return inTx(ctx, 'clear the draft', [DRAFT], 'readwrite', async (tx) => {
    await tx.objectStore(DRAFT).delete(DRAFT_KEY);
  });
}
