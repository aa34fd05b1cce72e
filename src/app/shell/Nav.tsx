/** Bottom navigation within thumb reach; each item at least 48 px tall. */
import { useT } from '../../i18n/useT';
import { StrokeIcon } from '../ui/Icon';
import { hrefFor, route } from './route';
import { NAV_SCREENS, navItemOf } from './screens';

export function Nav() {
  const t = useT();
  return (
    <nav class="bottom-nav" aria-label={t('app.nav.label')}>
      <ul>
        {NAV_SCREENS.map(({ id, icon }) => (
          <li key={id}>
            <a href={hrefFor(id)} aria-current={navItemOf(route.value) === id ? 'page' : undefined}>
              <StrokeIcon path={icon} />
              <span>{t(`app.nav.${id}`)}</span>
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}
