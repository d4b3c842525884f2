import type { ComponentType } from 'preact';
import { useEffect, useState } from 'preact/hooks';
import type { AppModel } from '../state/app-model';
import { afterFirstAnswer } from '../state/after-first-answer';

/**
 * The update prompt, and with it the service worker's registration (workbox-window), fetched and mounted only
 * once the first answer is on screen (or, with no case open, a few seconds after load): the service worker
 * then downloads its precache while the user reads the answer, not while the page is working towards it.
 */
export function UpdatePromptLater({ model }: { model: Pick<AppModel, 'get' | 'subscribe'> }) {
  const [Prompt, setPrompt] = useState<ComponentType | null>(null);
  useEffect(() => {
    let live = true;
    const cancel = afterFirstAnswer(model, () => {
      import('./UpdatePrompt').then(
        (m) => live && setPrompt(() => m.UpdatePrompt),
        (e: unknown) => console.error('Wetmode could not load its update prompt:', e),
      );
    });
    return () => {
      live = false;
      cancel();
    };
  }, [model]);
  return Prompt ? <Prompt /> : null;
}
