import { useEffect, useState } from 'preact/hooks';
import { onBeforeUpdate } from '../shell/before-update';
import type { AppServices } from './context';
import { clearFallback, readFallbacks, writeFallback } from './draft-fallback';
import { followStoreChanges } from './remote-changes';
import { createModel, createSectionModel, createSectionSolver, firstCase, mergeFallbacks } from './services';
import { openTabs, tabIdentity } from './tab';
import { openDeviceStoreOnce } from './early-store';
import { lastOpenCase, rememberOpenCase } from './last-case';

/**
 * Creates the services once, opens the device store, and opens the first case (this tab's draft, a closed tab's
 * draft in a new tab, or the demo on a fresh device) unless the page was opened from a shared link. Whatever
 * fails on the way, the store and the Cases screen still open. Drafts are flushed before an app update and when
 * the page is hidden; a synchronous copy goes to localStorage as the page goes away (see draft-fallback.ts).
 */
export function useBoot(openingLink: boolean): AppServices {
  const [services, setServices] = useState<AppServices>(() => {
    const sectionSolver = createSectionSolver();
    return { model: createModel(), section: createSectionModel(sectionSolver), sectionSolver, store: null, storeMessage: null };
  });
  useEffect(() => {
    let cancelled = false;
    let unfollow = () => {};
    const { model, section, sectionSolver } = services;
    let tab = tabIdentity();
    void (async () => {
      const early = await openDeviceStoreOnce();
      tab = early.tab;
      const opened = early.opened;
      if (cancelled) return;
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
          unfollow = followStoreChanges(store, model);
        }
        if (!openingLink && !model.get().doc) {
          const first = await firstCase(store, tab.fresh, await openTabs(), lastOpenCase(tab.fresh));
          if (first && !cancelled) {
            model.open(first.doc, first.mode, first.saved, first.baseRevision);
            // A first start (or a return to unsaved work) lands on the form, not an empty list.
            if (location.hash === '' || location.hash === '#' || location.hash === '#/') location.hash = first.mode === 'received' ? '#/results' : '#/member';
          }
        }
      } catch (e) {
        // Never let a case stop the app from starting: the store and the Cases screen open regardless.
        console.error('Wetmode could not reopen the last case:', e);
      } finally {
        if (!cancelled) setServices({ model, section, sectionSolver, store, storeMessage: opened.message, storeRetryable: opened.retryable });
      }
    })();
    // Remember the open case (saved or not) so the next start reopens it; a received case is not the user's own.
    let lastId: string | null | undefined;
    const unremember = model.subscribe(() => {
      const { doc, mode } = model.get();
      if (!doc && lastId === undefined) return; // nothing opened yet this start: keep what the last start left
      const id = doc && mode === 'editing' ? doc.id : doc ? lastId ?? null : null;
      if (id !== lastId) {
        lastId = id;
        rememberOpenCase(id);
      }
    });
    const offUpdate = onBeforeUpdate(() => model.flushDraft({ everyCase: true }));
    // Synchronous: an IndexedDB write started here may never commit before the page is gone.
    const keepCopy = () => {
      const { doc, mode, baseRevision } = model.get();
      if (doc && mode === 'editing' && model.unsaved()) writeFallback(tab.id, doc, baseRevision, false);
    };
    const onHide = () => {
      if (document.visibilityState === 'hidden') {
        keepCopy();
        void model.flushDraft();
      }
    };
    const onPageHide = () => {
      keepCopy();
      void model.flushDraft();
    };
    document.addEventListener('visibilitychange', onHide);
    addEventListener('pagehide', onPageHide);
    return () => {
      cancelled = true;
      unfollow();
      unremember();
      offUpdate();
      document.removeEventListener('visibilitychange', onHide);
      removeEventListener('pagehide', onPageHide);
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- services are created once
  }, []);
  return services;
}
