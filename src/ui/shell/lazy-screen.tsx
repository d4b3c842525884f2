import type { ComponentType } from 'preact';
import { useEffect, useState } from 'preact/hooks';

/**
 * A screen whose code is fetched on first use (a chunk of its own, precached by the service worker for offline
 * use), so the first load carries only the Member screen. While it loads a short status line shows; once it
 * has, focus moves to its heading as it does for a screen that was already there.
 */
export function lazyScreen<P extends object>(name: string, load: () => Promise<ComponentType<P>>): ComponentType<P> {
  let loaded: ComponentType<P> | null = null;
  let loading: Promise<ComponentType<P>> | null = null;
  const start = () => {
    loading ??= load().then(
      (c) => (loaded = c),
      (e: unknown) => {
        loading = null; // try again on the next visit
        throw e;
      },
    );
    return loading;
  };
  function LazyScreen(props: P) {
    const [, setReady] = useState(loaded !== null);
    const [error, setError] = useState<string | null>(null);
    useEffect(() => {
      if (loaded) return;
      let live = true;
      start().then(
        () => {
          if (!live) return;
          setReady(true);
          requestAnimationFrame(() => document.getElementById('screen-title')?.focus());
        },
        (e: unknown) => live && setError(e instanceof Error ? e.message : String(e)),
      );
      return () => {
        live = false;
      };
    }, []);
    const Screen = loaded;
    if (Screen) return <Screen {...props} />;
    if (error) return <p class="notice" role="alert">The {name} screen could not be loaded ({error}). Reload the page to try again.</p>;
    return <p class="loading-screen" role="status">Loading the {name} screen…</p>;
  }
  LazyScreen.displayName = `Lazy(${name})`;
  return LazyScreen;
}
