/** A small visible state: getting ready for offline use, ready, or working offline now. */
import { useT } from '../i18n/useT';
import { offline, offlineReady } from './state';

export function OfflineStatus() {
  const t = useT();
  const state = offline.value ? 'offline' : offlineReady.value ? 'ready' : 'preparing';
  return (
    <span class={`offline-status offline-status-${state}`} role="status" data-offline-state={state}>
      {t(`app.pwa.status.${state}`)}
    </span>
  );
}
