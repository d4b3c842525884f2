/**
 * Work that must finish before a new app version takes over the page, such as saving the open case
 * as a draft. The update prompt awaits every registered hook before it lets the new service worker in;
 * if one fails, the update is not applied and the user is told.
 */
type Hook = () => Promise<void> | void;

const hooks = new Set<Hook>();

export function onBeforeUpdate(hook: Hook): () => void {
  hooks.add(hook);
  return () => hooks.delete(hook);
}

export async function runBeforeUpdate(): Promise<void> {
  for (const hook of [...hooks]) await hook();
}
