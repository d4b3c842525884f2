import { useEffect, useState } from 'preact/hooks';
import { useRegisterSW } from 'virtual:pwa-register/preact';
import { runBeforeUpdate } from './before-update';

const OFFLINE_SHOWN_KEY = 'wetmode.offlineReadyShown';

/** True once the user of this tab tapped "Update now": only then does this tab reload when the new version takes over. */
let acceptedHere = false;

/**
 * Service-worker status, quietly: "ready to work offline" once after the first install, and a prompt
 * when a new version is waiting. The update happens only when the user accepts, after drafts are saved.
 * Registration is done by workbox-window through the plugin's register module, in production builds only.
 */
export function UpdatePrompt() {
  const {
    offlineReady: [offlineReady, setOfflineReady],
    needRefresh: [needRefresh, setNeedRefresh],
    updateServiceWorker,
  } = useRegisterSW({
    immediate: import.meta.env.PROD,
    // When the new version takes control (after "Update now" in any tab), only the tab where the user accepted
    // reloads. The others keep their prompt and their open case until their user says so (see acceptedHere).
    onNeedReload: () => {
      if (acceptedHere) location.reload();
    },
  });
  const [showOffline, setShowOffline] = useState(false);
  const [error, setError] = useState<string | null>(null);

  useEffect(() => {
    if (!offlineReady) return;
    let shown = false;
    try {
      shown = localStorage.getItem(OFFLINE_SHOWN_KEY) === '1';
      localStorage.setItem(OFFLINE_SHOWN_KEY, '1');
    } catch {
      /* private mode: show it each time rather than never */
    }
    if (!shown) {
      setShowOffline(true);
      // A quiet note: it goes away by itself after a while.
      const t = setTimeout(() => setShowOffline(false), 12_000);
      return () => clearTimeout(t);
    }
  }, [offlineReady]);

  async function accept() {
    try {
      await runBeforeUpdate();
      // Nothing waits when the page is not yet controlled (the very first visit: the new worker is already
      // active) or when another tab already let the new version in: a plain reload brings it in.
      const waiting = (await navigator.serviceWorker?.getRegistration())?.waiting;
      if (!navigator.serviceWorker?.controller || !waiting) {
        location.reload();
        return;
      }
      acceptedHere = true;
      await updateServiceWorker(true);
    } catch (e) {
      setError(`Update not applied: your work could not be saved first (${e instanceof Error ? e.message : String(e)}).`);
    }
  }

  if (!showOffline && !needRefresh) return null;
  return (
    <div class="toast" role="status" aria-live="polite">
      {needRefresh ? (
        <>
          <span>A new version of Wetmode is ready. Your open case is saved as a draft first.</span>
          <button type="button" class="btn primary" onClick={accept}>Update now</button>
          <button type="button" class="btn" onClick={() => setNeedRefresh(false)}>Later</button>
          {error && <span class="toast-error">{error}</span>}
        </>
      ) : (
        <>
          <span>Ready to work offline: Wetmode now runs here without a signal.</span>
          <button type="button" class="btn" onClick={() => { setShowOffline(false); setOfflineReady(false); }}>OK</button>
        </>
      )}
    </div>
  );
}
