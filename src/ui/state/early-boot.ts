/**
 * The boot of the page, started as the app's script runs, before the UI mounts: the solver worker starts, the
 * device store opens, and the first case (this tab's draft, a closed tab's draft, the last case, or the demo on a
 * fresh device) is opened in the model, which reads it with the quick unit reader and sends it to the worker at
 * once. The UI then mounts on a model that is already solving, straight onto the Member screen. Whatever fails on
 * the way, the store and the Cases screen still open. One boot per page; `useBoot` takes it over.
 */
import type { CaseStore } from '../../store';
import type { AppServices } from './context';
import { clearFallback, readFallbacks } from './draft-fallback';
import { openDeviceStoreOnce } from './early-store';
import { lastOpenCase } from './last-case';
import { followStoreChanges } from './remote-changes';
import { createModel, createSectionModel, createSectionSolver, firstCase, mergeFallbacks } from './services';
import { openTabs, type TabIdentity } from './tab';
import { markOnce } from './boot-marks';
import { likelyFirstRequest } from './first-request';

export type BootServices = Pick<AppServices, 'model' | 'section' | 'sectionSolver'>;

export interface BootOutcome {
  tab: TabIdentity;
  store: CaseStore | null;
  storeMessage: string | null;
  storeRetryable: boolean;
}

export interface Boot {
  services: BootServices;
  /** Settles (never rejects) once the store is open (or known unavailable) and the first case, if any, is open. */
  outcome: Promise<BootOutcome>;
  /** The outcome once settled (null before): a UI mounted after it starts with the store and renders once. */
  settled: BootOutcome | null;
}

let boot: Boot | null = null;

/** The page's boot, started on the first call; `openingLink`: the page opens a shared link, so no case is reopened. */
export function bootOnce(openingLink: boolean): Boot {
  if (boot) return boot;
  const sectionSolver = createSectionSolver();
  const services: BootServices = { model: createModel(), section: createSectionModel(sectionSolver), sectionSolver };
  // The worker starts on the likeliest first case now, while the store opens (a few hundred ms on a slow tablet).
  if (!openingLink) {
    const guess = likelyFirstRequest();
    if (guess) services.model.prefetch(guess);
  }
  const made: Boot = { services, settled: null, outcome: openFirstCase(services.model, openingLink).then((o) => (made.settled = o)) };
  boot = made;
  return made;
}

/** Opens the store, merges the localStorage draft copies, and opens the first case in the model. Never rejects. */
async function openFirstCase(model: BootServices['model'], openingLink: boolean): Promise<BootOutcome> {
  const { tab, opened } = await openDeviceStoreOnce();
  markOnce('wetmode:store-open');
  const store = opened.store;
  try {
    if (store) {
      await mergeFallbacks(store, readFallbacks(), clearFallback);
      model.setDraftSink({
        saveDraft: async (c, baseRevision, received) => {
          const r = await store.saveDraft(c, baseRevision, received);
          return r.ok ? { ok: true } : { ok: false, message: r.message };
        },
      });
      followStoreChanges(store, model); // for the page's life, as the model is
    }
    if (!openingLink && !model.get().doc) {
      const first = await firstCase(store, tab.fresh, await openTabs(), lastOpenCase(tab.fresh));
      // The user may have opened a case (from the Cases list) while the store was read: theirs stands.
      if (first && !model.get().doc) {
        model.open(first.doc, first.mode, first.saved, first.baseRevision);
        // A first start (or a return to unsaved work) lands on the form, not an empty list.
        if (location.hash === '' || location.hash === '#' || location.hash === '#/') location.hash = first.mode === 'received' ? '#/results' : '#/member';
      }
    }
  } catch (e) {
    // Never let a case stop the app from starting: the store and the Cases screen open regardless.
    console.error('Wetmode could not reopen the last case:', e);
  }
  return { tab, store, storeMessage: opened.message, storeRetryable: opened.retryable };
}
