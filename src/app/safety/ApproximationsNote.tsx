/** The register of approximate constants, one tap away on the safety screen: every number a result rests on that is recalled or common practice. */
import type { ScreenContext } from '../settings/screenContext';
import { approximationRows } from './approximations';

export function ApproximationsNote({ ctx }: { ctx: ScreenContext }) {
  const { t, show } = ctx;
  return (
    <section class="card approximations" aria-labelledby="approximations-title">
      <h2 id="approximations-title">{t('app.approximations.title')}</h2>
      <p>{t('app.approximations.intro')}</p>
      <details class="disclosure">
        <summary>{t('app.approximations.show')}</summary>
        <ul class="approximation-list">
          {approximationRows(t, show).map((row) => (
            <li key={row.id}>
              <strong>{row.name}</strong>
              <span class="approximation-value">{row.value}</span>
              <span class="approximation-basis">{row.basis}</span>
              <span>{row.effect}</span>
            </li>
          ))}
        </ul>
      </details>
    </section>
  );
}
