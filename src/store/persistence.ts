/**
 * Persistent storage and quota. Without persistence a browser may clear site data under storage pressure;
 * asking is how a web app keeps a surveyor's cases through a full phone. Both work without the database.
 */

/** The part of `navigator.storage` used here (injectable for tests). */
export type StorageLike = Partial<Pick<StorageManager, 'persist' | 'persisted' | 'estimate'>>;

export type PersistenceAnswer = 'granted' | 'refused' | 'unsupported';

export type QuotaEstimate =
  | { supported: true; usageBytes: number; quotaBytes: number; /** usage / quota, 0…1 */ usedFraction: number }
  | { supported: false };

export function defaultStorage(): StorageLike | undefined {
  return typeof navigator !== 'undefined' ? navigator.storage : undefined;
}

/**
 * Asks the browser to keep Wetmode's data under storage pressure. 'granted' if it already is or now will be;
 * 'refused' if the browser says no (Chrome decides by engagement, Firefox asks the user, Safari may refuse);
 * 'unsupported' where the API is missing (older browsers, insecure origins).
 */
export async function requestPersistence(storage: StorageLike | undefined | null = defaultStorage()): Promise<PersistenceAnswer> {
  if (!storage || typeof storage.persist !== 'function') return 'unsupported';
  try {
    if (typeof storage.persisted === 'function' && (await storage.persisted())) return 'granted';
    return (await storage.persist()) ? 'granted' : 'refused';
  } catch {
    return 'refused';
  }
}

/** How much of the site's quota is used; `{ supported: false }` where the browser cannot say. */
export async function estimateQuota(storage: StorageLike | undefined | null = defaultStorage()): Promise<QuotaEstimate> {
  if (!storage || typeof storage.estimate !== 'function') return { supported: false };
  try {
    const { usage, quota } = await storage.estimate();
    if (typeof usage !== 'number' || typeof quota !== 'number' || !(quota > 0)) return { supported: false };
    return { supported: true, usageBytes: usage, quotaBytes: quota, usedFraction: Math.min(1, usage / quota) };
  } catch {
    return { supported: false };
  }
}
