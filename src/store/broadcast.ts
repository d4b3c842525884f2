/**
 * Telling the other tabs and windows of this app what changed in the store, so their screens (the Cases list,
 * the open case) follow. `BroadcastChannel` reaches every same-origin page of this browser profile except the
 * sender; where it does not exist (old browsers, some embedded views) changes simply are not announced.
 */

/** What one tab tells the others. `revision` is the case's revision after the change (absent for a delete). */
export type StoreChange =
  | { type: 'saved'; id: string; revision: number; from: string }
  | { type: 'deleted'; id: string; from: string }
  | { type: 'drafts'; from: string };

export const CHANNEL_NAME = 'wetmode-store';

export interface ChangeChannel {
  post(change: StoreChange): void;
  listen(fn: (change: StoreChange) => void): () => void;
  close(): void;
}

function isChange(v: unknown): v is StoreChange {
  if (typeof v !== 'object' || v === null) return false;
  const c = v as Record<string, unknown>;
  if (typeof c.from !== 'string') return false;
  if (c.type === 'drafts') return true;
  if (typeof c.id !== 'string') return false;
  return c.type === 'deleted' || (c.type === 'saved' && typeof c.revision === 'number');
}

/** A channel over BroadcastChannel, or one that does nothing where it is missing (`factory` for tests). */
export function openChangeChannel(factory: ((name: string) => BroadcastChannel) | null = defaultFactory()): ChangeChannel {
  let channel: BroadcastChannel | null = null;
  try {
    channel = factory ? factory(CHANNEL_NAME) : null;
  } catch {
    channel = null;
  }
  const listeners = new Set<(c: StoreChange) => void>();
  if (channel) {
    channel.onmessage = (e: MessageEvent) => {
      if (!isChange(e.data)) return;
      for (const fn of listeners) fn(e.data);
    };
  }
  return {
    post(change) {
      try {
        channel?.postMessage(change);
      } catch {
        /* closed: nothing to tell */
      }
    },
    listen(fn) {
      listeners.add(fn);
      return () => listeners.delete(fn);
    },
    close() {
      listeners.clear();
      channel?.close();
      channel = null;
    },
  };
}

function defaultFactory(): ((name: string) => BroadcastChannel) | null {
  return typeof BroadcastChannel === 'function' ? (name) => new BroadcastChannel(name) : null;
}
