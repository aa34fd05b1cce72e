/** Top bar: the name, whether the app is ready offline, and the safety notes one tap away. */
import { useT } from '../../i18n/useT';
import { OfflineStatus } from '../../pwa/OfflineStatus';
import { StrokeIcon } from '../ui/Icon';
import { hrefFor, route } from './route';
import { HEADER_SCREEN } from './screens';

export function Header() {
  const t = useT();
  return (
    <header class="top">
      <span class="brand">
        <svg class="brand-mark" viewBox="0 0 24 24" width="26" height="26" aria-hidden="true" focusable="false">
          <circle class="brand-case" cx="12" cy="12" r="9" />
          <circle class="brand-core" cx="12" cy="12" r="6" />
        </svg>
        <span class="brand-name">{t('app.name')}</span>
      </span>
      <OfflineStatus />
      <a
        class="safety-link"
        href={hrefFor(HEADER_SCREEN.id)}
        aria-current={route.value === HEADER_SCREEN.id ? 'page' : undefined}
      >
        <StrokeIcon path={HEADER_SCREEN.icon} />
        <span>{t(`app.nav.${HEADER_SCREEN.id}`)}</span>
      </a>
    </header>
  );
}
