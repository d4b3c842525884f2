/**
 * Opens the device store as soon as the app's script runs, rather than after the first paint (when the boot
 * effect runs): on a slow tablet that paint takes a tenth of a second or more, and the store is on the way to
 * the first answer. The tab claims its identity first (drafts are kept by tab). The boot effect then takes the
 * same opening.
 */
import { openDeviceStore, type StoreOpening } from './services';
import { claimTab, type TabIdentity } from './tab';

export interface EarlyOpening {
  tab: TabIdentity;
  opened: StoreOpening;
}

let opening: Promise<EarlyOpening> | null = null;

/** The one opening of the device store for this page (started on the first call). */
export function openDeviceStoreOnce(): Promise<EarlyOpening> {
  opening ??= (async () => {
    const tab = await claimTab();
    return { tab, opened: await openDeviceStore(tab.id) };
  })();
  return opening;
}
