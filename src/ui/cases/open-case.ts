/**
 * Saving and exporting the open case (the one in the model). Used by the Cases screen (before another case
 * replaces an unsaved one), by the received banner, and available to the Member screen's Save button.
 */
import { sameCaseContent, type Case } from '../../case';
import type { CaseStore, StoreErrorKind } from '../../store';
import { CASE_FILE_MIME, caseFileName, caseToFileText } from '../../share/file';
import { keyResultOf, type AppModel } from '../state/app-model';
import { downloadText } from './download';
import { existingBandModel } from '../state/band-context';
import { askPersistenceOnce } from './persistence';
import { quoted, receivedOutcomeWords, sentence } from './words';

/**
 * The open case with the key result of its current results, ready to save or export. Results computed for
 * other inputs are not kept with it (the list would show a number that does not belong to the case).
 */
export function docForSaving(model: Pick<AppModel, 'get' | 'resultsCurrent'>): Case | null {
  const { doc, results } = model.get();
  if (!doc) return null;
  const { keyResult: _old, ...rest } = doc;
  const kr = model.resultsCurrent() ? keyResultOf(results) : undefined;
  const bandVerdict = kr ? existingBandModel(model)?.currentVerdict() : undefined;
  const keyResult = kr && bandVerdict ? { ...kr, bandVerdict } : kr;
  return keyResult ? { ...rest, keyResult } : rest;
}

export type SaveOutcome = { ok: true; saved: Case; text: string } | { ok: false; text: string; kind?: StoreErrorKind };

/**
 * Saves the open case: an editable one with `saveCase` (replacing its own saved version), a received one with
 * `saveReceived` (never overwriting). Then marks it saved in the model, clears the draft and asks once for
 * persistent storage.
 */
export async function saveOpenCase(store: CaseStore, model: AppModel): Promise<SaveOutcome> {
  const doc = docForSaving(model);
  if (!doc) return { ok: false, text: 'There is no open case to save.' };
  const opened = model.get().doc;
  // If the user edits while the store works, the model keeps the newer edits (still unsaved), not the saved copy.
  const markSaved = (saved: Case) => {
    if (model.get().doc === opened) model.markSaved(saved);
  };
  if (model.get().mode === 'received') {
    const r = await store.saveReceived(doc);
    if (!r.ok) return { ok: false, text: sentence(r.message), kind: r.kind };
    markSaved(r.value.case);
    void askPersistenceOnce(store);
    return { ok: true, saved: r.value.case, text: receivedOutcomeWords(r.value) };
  }
  const r = await store.saveCase(doc);
  if (!r.ok) return { ok: false, text: sentence(r.message), kind: r.kind };
  if (model.get().doc === opened) {
    model.markSaved(r.value);
    // The draft held these same edits; a failure to clear it only means it is offered again later.
    void store.clearDraft();
  }
  void askPersistenceOnce(store);
  return { ok: true, saved: r.value, text: `Saved ${quoted(r.value)}.` };
}

/** Downloads a case as a `.wetmode.json` file; the message says what happened. */
export function exportCaseFile(doc: Case): { ok: boolean; text: string } {
  let text: string;
  try {
    text = caseToFileText(doc);
  } catch (e) {
    return { ok: false, text: `Could not export ${quoted(doc)}: ${e instanceof Error ? e.message : String(e)}` };
  }
  const name = caseFileName(doc);
  const problem = downloadText(text, name, CASE_FILE_MIME);
  return problem ? { ok: false, text: problem } : { ok: true, text: `Exported ${quoted(doc)} as the file ${name}.` };
}

/*
 * Keeping the open case in step with changes made to its saved copy from the Cases list. Only an editable case
 * with the same id is touched; a received case is never changed by the list.
 */

/** Its saved copy was deleted: the open case, if it had no other changes, is now unsaved. */
export function afterDeleted(model: AppModel, id: string): void {
  const { doc, mode } = model.get();
  if (doc && doc.id === id && mode === 'editing' && !model.unsaved()) model.open(doc, 'editing', false);
}

/** Its saved copy came back: if the content is the same, the open case is saved again. */
export function afterRestored(model: AppModel, restored: Case): void {
  const { doc, mode } = model.get();
  if (doc && doc.id === restored.id && mode === 'editing' && sameCaseContent(doc, restored)) model.markSaved(restored);
}

/** Its saved copy was renamed: the open case takes the new name (and stays saved if it was). */
export function afterRenamed(model: AppModel, renamed: Case): void {
  const { doc, mode } = model.get();
  if (!doc || doc.id !== renamed.id || mode !== 'editing') return;
  if (!model.unsaved()) model.markSaved({ ...doc, name: renamed.name, updatedAt: renamed.updatedAt });
  else model.edit((d) => ({ ...d, name: renamed.name }));
}
