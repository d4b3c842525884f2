import { useEffect, useState } from 'preact/hooks';
import { useRegisterSW } from 'virtual:pwa-register/preact';
import { runBeforeUpdate } from './before-update';

const OFFLINE_SHOWN_KEY = 'wetmode.offlineReadyShown';

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
  } = useRegisterSW({ immediate: import.meta.env.PROD });
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
      // On the very first visit the page is not yet controlled: the new worker is already active (nothing
      // waits), so a plain reload is what brings the new version in.
      if (!navigator.serviceWorker?.controller) {
        location.reload();
        return;
      }
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
