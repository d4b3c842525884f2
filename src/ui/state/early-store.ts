/**
 * Opens the device store as soon as the app's script runs, rather than after the first paint: on a slow tablet
 * that paint takes a tenth of a second or more, and the store is on the way to the first answer. The database
 * opens while the tab claims its identity (drafts are kept by tab): the claim almost always keeps the tab's id,
 * and when it does not (a duplicated tab) the store is opened again under the new one. The boot takes this
 * opening; when it has opened the first case without the store (early-boot.ts), it starts it once that case's
 * answer is in, so the store's work on the main thread does not hold the answer back.
 */
import { openDeviceStore, type StoreOpening } from './services';
import { claimTab, tabIdentity, type TabIdentity } from './tab';

export interface EarlyOpening {
  tab: TabIdentity;
  opened: StoreOpening;
}

let opening: Promise<EarlyOpening> | null = null;

/** The one opening of the device store for this page (started on the first call). */
export function openDeviceStoreOnce(): Promise<EarlyOpening> {
  opening ??= (async () => {
    const provisional = tabIdentity().id;
    const [tab, first] = await Promise.all([claimTab(), openDeviceStore(provisional)]);
    if (tab.id === provisional) return { tab, opened: first };
    first.store?.close();
    return { tab, opened: await openDeviceStore(tab.id) };
  })();
  return opening;
}
