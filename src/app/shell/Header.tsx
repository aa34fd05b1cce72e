/** Top bar: the name, whether the app is ready offline, and the safety notes one tap away. */
import { useT } from '../../i18n/useT';
import { OfflineStatus } from '../../pwa/OfflineStatus';
import type { ComponentType } from 'preact';
import { useEffect, useState } from 'preact/hooks';
import { withFullLocale } from '../../i18n/useT';
import { shopConfigured, shopSettings } from '../sync/state';
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
      <ShopStatus />
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

/**
 * The shop server's status, loaded (code and words) only on a device that has a server set up;
 * loading it starts the replication, after the first paint.
 */
function ShopStatus() {
  const configured = shopConfigured(shopSettings.value);
  const [Badge, setBadge] = useState<ComponentType | null>(null);
  useEffect(() => {
    if (!configured) return;
    void withFullLocale(() => import('../sync/SyncBadge'))().then((mod) => {
      setBadge(() => mod.SyncBadge);
      mod.startShopSync();
    });
  }, [configured]);
  return configured && Badge ? <Badge /> : null;
}
