import { useEffect, useState } from 'preact/hooks';
import { onBeforeUpdate } from '../shell/before-update';
import type { AppServices } from './context';
import { createModel, firstCase } from './services';
import { openDeviceStoreOnce } from './early-store';

/**
 * Creates the services once, opens the device store, and opens the first case (draft, or the demo on a
 * fresh device) unless the page was opened from a shared link. Drafts are flushed before an app update and
 * whenever the page is hidden (tablet switched off, app switched away).
 */
export function useBoot(openingLink: boolean): AppServices {
  const [services, setServices] = useState<AppServices>(() => ({ model: createModel(), store: null, storeMessage: null }));
  useEffect(() => {
    let cancelled = false;
    const { model } = services;
    void (async () => {
      const opened = await openDeviceStoreOnce();
      if (cancelled) return;
      if (opened.store) model.setDraftSink({ saveDraft: async (c) => {
        const r = await opened.store.saveDraft(c);
        return r.ok ? { ok: true } : { ok: false, message: r.message };
      } });
      if (!openingLink && !model.get().doc) {
        const first = await firstCase(opened.store);
        if (first && !cancelled) {
          model.open(first.doc, 'editing', first.saved);
          // A first start (or a return to unsaved work) lands on the form, not an empty list.
          if (location.hash === '' || location.hash === '#' || location.hash === '#/') location.hash = '#/member';
        }
      }
      if (!cancelled) setServices({ model, store: opened.store, storeMessage: opened.message, storeRetryable: opened.retryable });
    })();
    const offUpdate = onBeforeUpdate(() => model.flushDraft());
    const onHide = () => {
      if (document.visibilityState === 'hidden') void model.flushDraft();
    };
    document.addEventListener('visibilitychange', onHide);
    addEventListener('pagehide', onHide);
    return () => {
      cancelled = true;
      offUpdate();
      document.removeEventListener('visibilitychange', onHide);
      removeEventListener('pagehide', onHide);
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- services are created once
  }, []);
  return services;
}
