/**
 * Saving and exporting the open case (the one in the model). Used by the Cases screen (before another case
 * replaces an unsaved one), by the received banner, and available to the Member screen's Save button.
 */
import { CASE_LIMITS, cutText, sameCaseContent, type Case } from '../../case';
import { newCaseId, revisionOf, type CaseStore, type StoreErrorKind } from '../../store';
import { clearFallback } from '../state/draft-fallback';
import { tabIdentity } from '../state/tab';
import { CASE_FILE_MIME, caseFileName, caseToFileText } from '../../share/file';
import { MAX_FILE_PHOTOS } from '../../share/site-evidence';
import { evidenceOf } from '../../attachments/evidence-io';
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
  // Based on the saved revision the edits started from: if another tab saved since, the store refuses and the
  // user chooses (ConflictPrompt); nothing is overwritten silently.
  const r = await store.saveCase(doc, { baseRevision: model.get().baseRevision });
  if (!r.ok) {
    if (r.kind === 'conflict' && model.get().doc === opened) model.setConflict({ theirs: r.theirs?.case ?? null, revision: r.theirs?.revision ?? 0 });
    return { ok: false, text: sentence(r.message), kind: r.kind };
  }
  await afterOwnSave(store, model, opened, r.value);
  return { ok: true, saved: r.value, text: `Saved ${quoted(r.value)}.` };
}

async function afterOwnSave(store: CaseStore, model: AppModel, opened: Case | null, saved: Case): Promise<void> {
  if (model.get().doc === opened) {
    // The draft held these same edits. It is cleared before the screen says "Saved": a reload straight after
    // would otherwise find the older draft (its clearing cut short by the unload) and reopen it as unsaved work.
    // A failure to clear it only means it is offered again later.
    clearFallback(tabIdentity().id);
    await store.clearDraft();
    if (model.get().doc === opened) model.markSaved(saved);
  }
  void askPersistenceOnce(store);
}

/** "Pile P7 (my version, 2026-12-03 09:12)": the name of the copy "Keep both" saves, within the name limit. */
export function conflictCopyName(name: string, at: Date): string {
  const two = (n: number) => String(n).padStart(2, '0');
  const when = `${at.getFullYear()}-${two(at.getMonth() + 1)}-${two(at.getDate())} ${two(at.getHours())}:${two(at.getMinutes())}`;
  const suffix = ` (my version, ${when})`;
  return cutText(name === '' ? 'Case' : name, CASE_LIMITS.nameChars - suffix.length) + suffix;
}

/**
 * The user's answer to a save conflict: 'mine' saves over the other version, 'theirs' opens the saved version
 * (the edits here are dropped), 'both' saves the edits here as a copy with a new id and a name that says so,
 * and leaves the other version as it is.
 */
export async function resolveConflict(store: CaseStore, model: AppModel, choice: 'mine' | 'theirs' | 'both'): Promise<SaveOutcome> {
  const { conflict } = model.get();
  const doc = docForSaving(model);
  if (!doc || !conflict) return { ok: false, text: 'There is no save waiting for a choice.' };
  const opened = model.get().doc;
  if (choice === 'theirs') {
    if (!conflict.theirs) return { ok: false, text: 'The other version cannot be read; keep yours, or keep both.' };
    model.open(conflict.theirs, 'editing', true, conflict.revision);
    void store.clearDraft();
    clearFallback(tabIdentity().id);
    return { ok: true, saved: conflict.theirs, text: `Opened the version saved elsewhere, ${quoted(conflict.theirs)}; your changes were dropped.` };
  }
  const toSave = choice === 'mine' ? doc : { ...doc, id: newCaseId(), name: conflictCopyName(doc.name, new Date()) };
  const r = choice === 'mine' ? await store.saveCase(toSave) : await store.saveCase(toSave, { baseRevision: null });
  if (!r.ok) return { ok: false, text: sentence(r.message), kind: r.kind };
  await afterOwnSave(store, model, opened, r.value);
  return {
    ok: true,
    saved: r.value,
    text: choice === 'mine' ? `Saved your version of ${quoted(r.value)} over the other one.` : `Kept both: yours is saved as ${quoted(r.value)}; the other version is unchanged.`,
  };
}

/**
 * Downloads a case as a `.wetmode.json` file with the site photos and location kept for it on this device; the
 * message says what happened, and when the evidence could not be read or not all photos fit.
 */
export async function exportCaseFile(doc: Case): Promise<{ ok: boolean; text: string }> {
  const evidence = await evidenceOf(doc.id);
  const count = evidence.ok ? evidence.value.photos.length : 0;
  let text: string;
  try {
    text = caseToFileText(doc, evidence.ok ? evidence.value : undefined);
  } catch (e) {
    return { ok: false, text: `Could not export ${quoted(doc)}: ${e instanceof Error ? e.message : String(e)}` };
  }
  const name = caseFileName(doc);
  const problem = downloadText(text, name, CASE_FILE_MIME);
  if (problem) return { ok: false, text: problem };
  const photos = count === 0 ? '' : count > MAX_FILE_PHOTOS ? ` It carries the first ${MAX_FILE_PHOTOS} of the ${count} site photos (a file holds at most ${MAX_FILE_PHOTOS}).` : ` It carries the ${count === 1 ? 'site photo' : `${count} site photos`}.`;
  // No storage (a browser without IndexedDB) means there is no evidence to carry: say so only for a real failure.
  const unread = !evidence.ok && !/offers no storage/.test(evidence.message) ? ` The site photos and location are not in it: ${evidence.message}` : '';
  return { ok: true, text: `Exported ${quoted(doc)} as the file ${name}.${photos}${unread}` };
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
  if (!model.unsaved()) model.markSaved({ ...doc, name: renamed.name, updatedAt: renamed.updatedAt }, revisionOf(renamed));
  else {
    model.edit((d) => ({ ...d, name: renamed.name }));
    // The rename was made here: the open edits now start from the renamed revision (no conflict with itself).
    model.setBaseRevision(revisionOf(renamed));
  }
}
