/**
 * The screens' one connection to the job log: opened on first use (the store code is in
 * this lazily loaded chunk, never in the first screen), reopened when another tab closed it,
 * and a change counter that every view reloads on, bumped by writes here and in other tabs.
 */
import { signal } from '@preact/signals';
import {
  openJobStore,
  persistentStorageStatus,
  requestPersistentStorage,
  failWith,
  type JobsResult,
  type JobStore,
  type LogDatabase,
  type PersistOutcome,
  storageFailure,
} from '../../jobs';
import { currentUser } from '../sync/session';
import { persisted } from '../ui/persist';

let opening: Promise<JobsResult<JobStore>> | undefined;

/** Bumped after every write to the log, in this tab or another. */
export const logChanges = signal(0);

const CHANNEL = 'casefront-job-log';
const channel = typeof BroadcastChannel === 'undefined' ? undefined : new BroadcastChannel(CHANNEL);
channel?.addEventListener('message', () => logChanges.value++);

/** Call after a successful write: this tab's views and every other tab's reload. */
export function announceChange(): void {
  logChanges.value++;
  channel?.postMessage('changed');
}

/** The browser's document database (IndexedDB underneath), loaded with the first use of the log. */
async function browserPouch(): Promise<(name: string) => LogDatabase> {
  const { default: PouchDB } = await import('pouchdb-browser');
  return (name) => new PouchDB(name) as LogDatabase;
}

/** The open store; a failed or closed one is opened again on the next call. */
export async function jobStore(): Promise<JobsResult<JobStore>> {
  const current = opening ? await opening : undefined;
  if (current?.ok && !current.value.closed) return current;
  if (typeof indexedDB === 'undefined') return failWith('storage.unavailable');
  opening = browserPouch().then(
    (pouch) => openJobStore({ pouch, user: currentUser }),
    () => failWith<JobStore>('storage.failed', { name: 'LoadFailed' }),
  );
  const result = await opening;
  if (!result.ok) opening = undefined;
  return result;
}

/** Runs `work` on the store and announces a change when it succeeded. */
export async function writeToLog<T>(work: (store: JobStore) => Promise<JobsResult<T>>): Promise<JobsResult<T>> {
  const store = await jobStore();
  if (!store.ok) return store;
  let result: JobsResult<T>;
  try {
    result = await work(store.value);
  } catch (error) {
    // Whatever the browser throws, the form gets a sentence and its button back.
    return storageFailure(error);
  }
  if (result.ok) announceChange();
  return result;
}

/** Whether the browser has been asked to keep the log (asked once, on the first save). */
const persistAsked = persisted<boolean>('log.persistAsked', false);

/** What the log screen says about keeping the log; undefined until known. */
export const persistence = signal<PersistOutcome | undefined>(undefined);

export async function refreshPersistence(): Promise<void> {
  persistence.value = await persistentStorageStatus();
}

/** On the first save on this device, asks the browser to keep the log when space runs low. */
export async function askPersistenceOnce(): Promise<void> {
  if (persistAsked.value) return;
  persistAsked.value = true;
  persistence.value = await requestPersistentStorage();
}
