/**
 * Service-worker registration from our own module (no inline script, so the CSP
 * can stay 'self'). The worker is generated with registerType 'prompt': a new
 * version waits until the user accepts; only then is the page reloaded. Form state
 * is saved on every keystroke (app/ui/persist.ts), so the reload loses nothing.
 */
import { watchReachability } from './reachability';
import { applyUpdate, offlineReady, updateWaiting } from './state';

export function registerServiceWorker(): void {
  watchReachability();
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  if (navigator.serviceWorker.controller) offlineReady.value = true; // a worker already serves this page from its cache
  void start();
}

async function start(): Promise<void> {
  const { Workbox } = await import('workbox-window');
  const base = import.meta.env.BASE_URL;
  const wb = new Workbox(`${base}sw.js`, { scope: base, type: 'classic' });
  let accepted = false;
  wb.addEventListener('waiting', () => {
    updateWaiting.value = true;
    applyUpdate.value = () => {
      accepted = true;
      wb.messageSkipWaiting();
    };
  });
  wb.addEventListener('controlling', () => {
    if (accepted) window.location.reload();
  });
  wb.addEventListener('activated', (event) => {
    if (!event.isUpdate) offlineReady.value = true;
  });
  try {
    await wb.register();
  } catch {
    // Registration can fail (private mode, file://): the app still works online.
  }
}
