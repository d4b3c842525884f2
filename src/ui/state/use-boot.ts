import { useEffect, useState } from 'preact/hooks';
import { onBeforeUpdate } from '../shell/before-update';
import type { AppServices } from './context';
import { writeFallback } from './draft-fallback';
import { bootOnce } from './early-boot';
import { tabIdentity } from './tab';
import { rememberOpenCase } from './last-case';

/**
 * Takes over the page's boot (early-boot.ts: worker, device store, first case, started before the UI mounted)
 * and publishes the store once it is open. Remembers the open case for the next start. Drafts are flushed before
 * an app update and when the page is hidden; a synchronous copy goes to localStorage as the page goes away (see
 * draft-fallback.ts).
 */
export function useBoot(openingLink: boolean): AppServices {
  const [services, setServices] = useState<AppServices>(() => {
    const { services: made, settled } = bootOnce(openingLink);
    return settled ? { ...made, store: settled.store, storeMessage: settled.storeMessage, storeRetryable: settled.storeRetryable } : { ...made, store: null, storeMessage: null };
  });
  // Whether the first render had the store's outcome: decided with the render, not in the effect after it (the
  // store may open between the two, and the screens would then never hear of it).
  const [mountedAfterBoot] = useState(() => bootOnce(openingLink).settled !== null);
  useEffect(() => {
    let cancelled = false;
    const { model, section, sectionSolver } = services;
    let tab = tabIdentity();
    void bootOnce(openingLink).outcome.then((o) => {
      tab = o.tab;
      // Mounted after the boot: the first render already had the store; another would redraw every screen for nothing.
      if (!cancelled && !mountedAfterBoot) setServices({ model, section, sectionSolver, store: o.store, storeMessage: o.storeMessage, storeRetryable: o.storeRetryable });
    });
    // Remember the open case (saved or not) so the next start reopens it; a received case is not the user's own.
    let lastId: string | null | undefined;
    const remember = () => {
      const { doc, mode } = model.get();
      if (!doc && lastId === undefined) return; // nothing opened yet this start: keep what the last start left
      const id = doc && mode === 'editing' ? doc.id : doc ? lastId ?? null : null;
      if (id !== lastId) {
        lastId = id;
        rememberOpenCase(id);
      }
    };
    const unremember = model.subscribe(remember);
    remember(); // the boot may have opened the first case already
    const offUpdate = onBeforeUpdate(() => model.flushDraft({ everyCase: true }));
    // Synchronous: an IndexedDB write started here may never commit before the page is gone.
    // Leaving for good (pagehide, not kept for back/forward): the next start may open this copy before its store is
    // open. The page also turns hidden as it unloads, after pagehide: that copy keeps the mark.
    let leaving = false;
    const keepCopy = () => {
      const { doc, mode, baseRevision } = model.get();
      if (doc && mode === 'editing' && model.unsaved()) writeFallback(tab.id, doc, baseRevision, false, leaving);
    };
    const onHide = () => {
      if (document.visibilityState === 'hidden') {
        keepCopy();
        void model.flushDraft();
      }
    };
    const onPageHide = (e: PageTransitionEvent) => {
      leaving = !e.persisted;
      keepCopy();
      void model.flushDraft();
    };
    document.addEventListener('visibilitychange', onHide);
    addEventListener('pagehide', onPageHide);
    return () => {
      cancelled = true;
      unremember();
      offUpdate();
      document.removeEventListener('visibilitychange', onHide);
      removeEventListener('pagehide', onPageHide);
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- services are created once
  }, []);
  return services;
}
