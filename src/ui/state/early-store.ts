/**
 * Opens the device store as soon as the app's script runs, rather than after the first paint (when the boot
 * effect runs): on a slow tablet that paint takes a tenth of a second or more, and the store is on the way to
 * the first answer. The boot effect then takes the same opening.
 */
import { openDeviceStore, type StoreOpening } from './services';

let opening: Promise<StoreOpening> | null = null;

/** The one opening of the device store for this page (started on the first call). */
export function openDeviceStoreOnce(): Promise<StoreOpening> {
  opening ??= openDeviceStore();
  return opening;
}
