/**
 * Asking the browser to keep the log when space runs low. Without it, a browser may evict
 * the whole database of a site not visited for a while.
 */
export type PersistOutcome = 'granted' | 'denied' | 'unsupported';

export interface StorageManagerLike {
  persist?: () => Promise<boolean>;
  persisted?: () => Promise<boolean>;
}

function storageManager(): StorageManagerLike | undefined {
  return typeof navigator === 'undefined' ? undefined : navigator.storage;
}

/** Requests persistent storage; already persisted counts as granted. */
export async function requestPersistentStorage(
  storage: StorageManagerLike | undefined = storageManager(),
): Promise<PersistOutcome> {
  if (!storage || typeof storage.persist !== 'function') return 'unsupported';
  try {
    if (typeof storage.persisted === 'function' && (await storage.persisted())) return 'granted';
    return (await storage.persist()) ? 'granted' : 'denied';
  } catch {
    return 'denied';
  }
}

/** Whether the log is already kept for good, without asking (nothing is shown to the user). */
export async function persistentStorageStatus(
  storage: StorageManagerLike | undefined = storageManager(),
): Promise<PersistOutcome> {
  if (!storage || typeof storage.persisted !== 'function') return 'unsupported';
  try {
    return (await storage.persisted()) ? 'granted' : 'denied';
  } catch {
    return 'denied';
  }
}
