/**
 * Live two-way replication of this device's log with the plant's database on the shop server,
 * retried after every cut (PouchDB's own back-off), and the status everyone reads in the header.
 * Sign-in is the server's own session (a cookie on this origin, so no CORS and a `'self'` CSP).
 * Loaded after the first paint, and only when a server is set up.
 */
import { effect } from '@preact/signals';
import PouchDB from 'pouchdb-browser';
import type { Emitter, LogDatabase } from '../../jobs';
import { jobStore, logChanges } from '../log/db';
import { signedIn, syncStatus, type SyncStatus } from './session';
import { shopConfigured, shopSettings, type ShopSettings } from './state';

interface PouchStatic {
  new (name: string, options?: Record<string, unknown>): LogDatabase;
  fetch(url: string, options: RequestInit): Promise<Response>;
}
const Pouch = PouchDB as unknown as PouchStatic;

let running: Emitter | undefined;
let watching = false;
let listening = false;

/** Waits between retries: PouchDB's doubling, but never more than 30 s (a shop floor's network comes and goes). */
const MAX_RETRY_MS = 30_000;
const backOff = (delay: number) => Math.min(MAX_RETRY_MS, Math.max(1000, delay * 2));
let pushedSeq: number | string = 0;

/** The server's address for a path under it (`_session`, the database). */
export function serverUrl(settings: ShopSettings, path: string): string {
  const base = settings.address.endsWith('/') ? settings.address : `${settings.address}/`;
  return new URL(`${base}${path}`, location.href).href;
}

function setStatus(changes: Partial<SyncStatus>): void {
  syncStatus.value = { ...syncStatus.value, ...changes };
}

export type SignInOutcome = { ok: true } | { ok: false; code: 'wrongPassword' | 'unreachable' | 'failed' };

interface SessionAnswer {
  userCtx?: { name?: string | null; roles?: string[] };
}

async function readSession(settings: ShopSettings): Promise<SessionAnswer | undefined> {
  try {
    const response = await fetch(serverUrl(settings, '_session'), { credentials: 'include' });
    return response.ok ? ((await response.json()) as SessionAnswer) : undefined;
  } catch {
    return undefined;
  }
}

/** Signs in with the person's own server user (CouchDB session); on success replication starts. */
export async function signIn(name: string, password: string): Promise<SignInOutcome> {
  const settings = shopSettings.value;
  let response: Response;
  try {
    response = await fetch(serverUrl(settings, '_session'), {
      method: 'POST',
      credentials: 'include',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ name, password }),
    });
  } catch {
    return { ok: false, code: 'unreachable' };
  }
  if (response.status === 401) return { ok: false, code: 'wrongPassword' };
  if (!response.ok) return { ok: false, code: 'failed' };
  const session = await readSession(settings);
  signedIn.value = { name: session?.userCtx?.name ?? name, roles: session?.userCtx?.roles ?? [] };
  await startSync();
  return { ok: true };
}

export async function signOut(): Promise<void> {
  stopSync();
  try {
    await fetch(serverUrl(shopSettings.value, '_session'), { method: 'DELETE', credentials: 'include' });
  } catch {
    // Offline: the cookie stays until it expires; this device no longer uses it.
  }
  signedIn.value = { name: '', roles: [] };
  setStatus({ state: shopConfigured() ? 'signedOut' : 'off', pending: 0 });
}

export function stopSync(): void {
  running?.cancel();
  running = undefined;
}

/** Local changes the server does not have yet. */
async function countPending(db: LogDatabase): Promise<number> {
  try {
    const waiting = await db.changes({ since: pushedSeq, limit: 1000 });
    return waiting.results.filter((row) => !row.id.startsWith('_design/')).length;
  } catch {
    return syncStatus.value.pending;
  }
}

function errorStatus(error: unknown): number | undefined {
  return typeof error === 'object' && error !== null && 'status' in error ? Number(error.status) : undefined;
}

/** Starts (or restarts) live replication when a server is set up and someone is signed in. */
export async function startSync(): Promise<void> {
  stopSync();
  const settings = shopSettings.value;
  if (!shopConfigured(settings)) {
    setStatus({ state: 'off', pending: 0 });
    return;
  }
  const store = await jobStore();
  if (!store.ok) return;
  const db = store.value.db;
  setStatus({ state: 'connecting', pending: await countPending(db), received: 0 });
  const session = await readSession(settings);
  if (session === undefined) {
    // Unreachable: work on; replication starts when the server answers (retried by PouchDB below).
    setStatus({ state: 'offline', since: new Date().toISOString() });
  } else if (!session.userCtx?.name) {
    signedIn.value = { name: '', roles: [] };
    setStatus({ state: 'signedOut' });
    return;
  } else {
    signedIn.value = { name: session.userCtx.name, roles: session.userCtx.roles ?? [] };
  }
  const remote = new Pouch(serverUrl(settings, encodeURIComponent(settings.database.trim())), {
    skip_setup: true,
    fetch: (url: string, options: RequestInit) => Pouch.fetch(url, { ...options, credentials: 'include' }),
  });
  if (!listening) {
    listening = true;
    // The network is back: start again at once instead of waiting out the retry delay.
    window.addEventListener('online', () => {
      if (running) void startSync();
    });
  }
  if (!watching) {
    watching = true;
    // Every write here (or arrival) may change what waits for the server.
    effect(() => {
      if (logChanges.value >= 0) void noteLocalWrite();
    });
  }
  const handle = db.sync(remote, { live: true, retry: true, batch_size: 1000, back_off_function: backOff });
  running = handle;
  const isCurrent = () => running === handle;
  handle
    .on('change', (info) => {
      if (!isCurrent()) return;
      const { direction, change } = info as {
        direction: string;
        change: { last_seq?: number | string; docs_written?: number };
      };
      if (direction === 'push' && change.last_seq !== undefined) pushedSeq = change.last_seq;
      if (direction === 'pull') {
        const received = syncStatus.value.received + (change.docs_written ?? 0);
        // A first replication of a big log takes a while: its progress, until the server has nothing more.
        setStatus(syncStatus.value.state === 'refused' ? { received } : { received, state: 'receiving' });
        // The views read the log again; the store picks up what arrived.
        logChanges.value++;
      }
      void countPending(db).then((pending) => {
        if (syncStatus.value.state !== 'receiving' || direction === 'push')
          setStatus({ pending, state: pending > 0 ? 'waiting' : syncStatus.value.state });
        else setStatus({ pending });
      });
    })
    .on('paused', (error) => {
      if (!isCurrent()) return;
      if (error) {
        if (errorStatus(error) === 401) {
          setStatus({ state: 'signedOut' });
          stopSync();
          return;
        }
        if (syncStatus.value.state !== 'offline') setStatus({ state: 'offline', since: new Date().toISOString() });
        return;
      }
      void db.info().then(async (info) => {
        if (syncStatus.value.state !== 'refused') pushedSeq = info.update_seq;
        const pending = await countPending(db);
        if (syncStatus.value.state !== 'refused') setStatus({ state: pending > 0 ? 'waiting' : 'upToDate', pending });
      });
    })
    .on('active', () => {
      if (isCurrent() && syncStatus.value.state === 'offline') setStatus({ state: 'connecting' });
    })
    .on('denied', (error) => {
      if (!isCurrent()) return;
      const reason =
        typeof error === 'object' && error !== null && 'reason' in error ? String(error.reason) : 'unknown';
      setStatus({ state: 'refused', reason });
    })
    .on('error', (error) => {
      if (!isCurrent()) return;
      setStatus(
        errorStatus(error) === 401 ? { state: 'signedOut' } : { state: 'offline', since: new Date().toISOString() },
      );
    });
}

/** After a write on this device: how many changes wait for the server. */
export async function noteLocalWrite(): Promise<void> {
  if (!running) return;
  const store = await jobStore();
  if (!store.ok) return;
  const pending = await countPending(store.value.db);
  // While the first replication pulls, its own arrivals look like local changes: the progress stays.
  if (pending > 0 && !['refused', 'receiving'].includes(syncStatus.value.state))
    setStatus({ state: 'waiting', pending });
}
