/**
 * Whether the app's own server answers. `navigator.onLine` alone is not enough: it stays true
 * on a shop network whose server is down, and Chromium reports true again after a page that
 * went offline is reloaded from the service worker. A query string keeps the probe out of the
 * precache, so it always goes to the network.
 */
import { offline } from './state';

/** While offline, how often to look for the server again, ms. */
const RETRY_OFFLINE_MS = 30_000;

async function originAnswers(): Promise<boolean> {
  try {
    await fetch(`${import.meta.env.BASE_URL}?reachable=${Date.now()}`, { method: 'HEAD', cache: 'no-store' });
    return true; // any answer, even an error page, means the network and the server are there
  } catch {
    return false;
  }
}

async function check(): Promise<void> {
  offline.value = !navigator.onLine || !(await originAnswers());
}

export function watchReachability(): void {
  window.addEventListener('online', () => void check());
  window.addEventListener('offline', () => (offline.value = true));
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'visible') void check();
  });
  window.setInterval(() => {
    if (offline.value && document.visibilityState === 'visible') void check();
  }, RETRY_OFFLINE_MS);
  void check();
}
