/** Who is signed in to the shop server on this device, and how the log stands with the server. */
import { signal } from '@preact/signals';
import { persisted } from '../ui/persist';
import { shopConfigured } from './state';

export interface SignedIn {
  name: string;
  roles: string[];
}

/** The server user of this device's session; undefined when signed out or unknown. */
export const signedIn = persisted<SignedIn>('shop.session', { name: '', roles: [] }, (stored) => {
  const value = stored as Partial<SignedIn> | undefined;
  return typeof value?.name === 'string' && Array.isArray(value.roles)
    ? { name: value.name, roles: value.roles.filter((role): role is string => typeof role === 'string') }
    : { name: '', roles: [] };
});

export type SyncState =
  'off' | 'signedOut' | 'connecting' | 'receiving' | 'upToDate' | 'waiting' | 'offline' | 'refused';

export interface SyncStatus {
  state: SyncState;
  /** Local changes not yet on the server. */
  pending: number;
  /** When the server stopped answering (ISO time), for "offline since 14:02". */
  since?: string;
  /** A refusal's code (a key under `app.sync.refusals.`). */
  reason?: string;
  /** Documents received in the first replication so far, for its progress. */
  received: number;
}

export const syncStatus = signal<SyncStatus>({ state: 'off', pending: 0, received: 0 });

/** The name stamped on this device's changes: the signed-in server user (none when local only). */
export function currentUser(): string | undefined {
  return shopConfigured() && signedIn.value.name ? signedIn.value.name : undefined;
}

export const hasRole = (role: string): boolean => signedIn.value.roles.includes(role);
