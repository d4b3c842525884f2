/**
 * Work that should not compete with the app's first answer (fetching the unit reader, registering the service
 * worker): run once the open case's first answer (or solver message) is on screen and the page is idle, or, when
 * no case opens (the Cases list, a shared link), a few seconds after the page has loaded.
 */
import type { AppModel } from './app-model';

/** How long after the page's load event the work runs anyway when no answer has come. */
const NO_ANSWER_AFTER_LOAD_MS = 4000;

function whenIdle(run: () => void): void {
  if (typeof requestIdleCallback === 'function') requestIdleCallback(run, { timeout: 2000 });
  else setTimeout(run, 200);
}

/** Runs `run` once, after the model's first answer when idle, else after the load event and a wait. Returns a cancel. */
export function afterFirstAnswer(model: Pick<AppModel, 'get' | 'subscribe'>, run: () => void): () => void {
  let done = false;
  let timer: ReturnType<typeof setTimeout> | undefined;
  const once = () => {
    if (done) return;
    done = true;
    cancel();
    run();
  };
  const answered = () => {
    const { results, solverMessage } = model.get();
    return results !== null || solverMessage !== null;
  };
  const off = model.subscribe(() => {
    if (answered()) whenIdle(once);
  });
  const onLoad = () => {
    timer = setTimeout(once, NO_ANSWER_AFTER_LOAD_MS);
  };
  if (typeof document === 'undefined' || document.readyState === 'complete') onLoad();
  else addEventListener('load', onLoad, { once: true });
  function cancel() {
    off();
    if (timer !== undefined) clearTimeout(timer);
    if (typeof removeEventListener === 'function') removeEventListener('load', onLoad);
  }
  if (answered()) whenIdle(once);
  return () => {
    done = true;
    cancel();
  };
}
