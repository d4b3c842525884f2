/**
 * Keeping the open case in step with what other tabs and windows do to its saved copy (told by the store over
 * BroadcastChannel). An open case with no changes of its own takes the newer saved version and says so; one with
 * changes keeps them and says that the saved copy changed, so the next save asks which version to keep.
 */
import type { CaseStore, StoreChange } from '../../store';
import type { AppModel } from './app-model';

export const ELSEWHERE = {
  updated: 'This case was changed and saved in another tab or window; the newer version is shown.',
  changed: 'This case was changed and saved in another tab or window. Your changes here are kept; saving will ask which version to keep.',
  deleted: 'This case was deleted in another tab or window. It stays open here; save it to keep it.',
} as const;

export async function applyStoreChange(store: CaseStore, model: AppModel, change: StoreChange): Promise<void> {
  if (change.type === 'drafts') return;
  const { doc, mode, baseRevision } = model.get();
  if (!doc || mode !== 'editing' || doc.id !== change.id) return;
  if (change.type === 'deleted') {
    if (!model.unsaved()) model.open(doc, 'editing', false, null);
    model.setElsewhere(ELSEWHERE.deleted);
    return;
  }
  if (change.revision === baseRevision) return;
  if (model.unsaved()) {
    model.setElsewhere(ELSEWHERE.changed);
    return;
  }
  const fresh = await store.getCase(change.id);
  // Only if nothing changed here while the store was read.
  if (fresh.ok && model.get().doc === doc && !model.unsaved()) {
    model.open(fresh.value, 'editing', true);
    model.setElsewhere(ELSEWHERE.updated);
  }
}

/** Follows the store's changes for as long as the returned function is not called. */
export function followStoreChanges(store: CaseStore, model: AppModel): () => void {
  return store.onChange((change) => void applyStoreChange(store, model, change));
}
