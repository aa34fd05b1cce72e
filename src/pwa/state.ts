/** What the service worker has told us, as signals the shell shows. */
import { signal } from '@preact/signals';

/** Every asset is cached: the app works without a network from now on. */
export const offlineReady = signal(false);
/** A new version is installed and waiting for the user's go-ahead. */
export const updateWaiting = signal(false);
/** The browser reports no network, or the app's own server does not answer (reachability.ts). */
export const offline = signal(typeof navigator !== 'undefined' && !navigator.onLine);

/** Set by the registration: activates the waiting version (the page reloads once it controls). */
export const applyUpdate = signal<(() => void) | undefined>(undefined);
