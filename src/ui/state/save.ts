/**
 * Saving the open case on the device: with its key result, clearing the draft, and asking the browser once
 * to keep the data (persistent storage). Every failure comes back as words; nothing is lost on failure
 * (the draft stays).
 */
import type { CaseStore } from '../../store';
import { keyResultOf, type AppModel } from './app-model';

let persistenceAsked = false;

export type SaveOutcome = { ok: true; message: string } | { ok: false; message: string };

export async function saveOpenCase(model: AppModel, store: CaseStore | null): Promise<SaveOutcome> {
  const { doc, results } = model.get();
  if (!doc) return { ok: false, message: 'There is no open case to save.' };
  if (!store) return { ok: false, message: 'Cases cannot be kept on this device (storage is unavailable). Export the case as a file or copy its link instead.' };
  const keyResult = model.resultsCurrent() ? keyResultOf(results) : undefined;
  const r = await store.saveCase({ ...doc, keyResult });
  if (!r.ok) return { ok: false, message: r.message };
  model.markSaved(r.value);
  await store.clearDraft();
  let extra = '';
  if (!persistenceAsked) {
    persistenceAsked = true;
    const p = await store.requestPersistence();
    if (p === 'refused') extra = ' The browser did not promise to keep data: export important cases as files too.';
  }
  return { ok: true, message: `Saved "${r.value.name || 'Untitled'}" on this device.${extra}` };
}
