/** "A new version is ready": applied only when the user taps Update; Later hides it until the next start. */
import { signal } from '@preact/signals';
import { useT } from '../i18n/useT';
import { applyUpdate, updateWaiting } from './state';
import './pwa.css';

const dismissed = signal(false);

export function UpdatePrompt() {
  const t = useT();
  if (!updateWaiting.value || dismissed.value) return null;
  return (
    <div class="update-prompt" role="status">
      <p>{t('app.pwa.updateReady')}</p>
      <div class="update-actions">
        <button type="button" class="button button-primary" onClick={() => applyUpdate.value?.()}>
          {t('app.pwa.updateNow')}
        </button>
        <button type="button" class="button" onClick={() => (dismissed.value = true)}>
          {t('app.pwa.updateLater')}
        </button>
      </div>
    </div>
  );
}
