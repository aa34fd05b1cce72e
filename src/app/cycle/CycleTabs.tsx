/** The cycle item's two views: editing a cycle step by step, and planning one from the drawing's targets. */
import { useT } from '../../i18n/useT';
import { hrefFor } from '../shell/route';

const VIEWS = ['cycle', 'plan'] as const;

export function CycleTabs({ current }: { current: (typeof VIEWS)[number] }) {
  const t = useT();
  return (
    <nav class="view-tabs" aria-label={t('app.cycleTabs.label')}>
      {VIEWS.map((view) => (
        <a key={view} href={hrefFor(view)} aria-current={view === current ? 'page' : undefined}>
          {t(`app.cycleTabs.${view}`)}
        </a>
      ))}
    </nav>
  );
}
