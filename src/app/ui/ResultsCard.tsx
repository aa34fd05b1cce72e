/** The results block every calculating screen shares: general error, rows, cautions, extra content, the estimate note. */
import type { ComponentChildren } from 'preact';
import { useT } from '../../i18n/useT';
import { Cautions, ErrorNote } from './Notices';
import { ResultList, type ResultRow } from './ResultList';

export interface ResultsCardProps {
  id: string;
  /** The worded general error, if any. */
  error: string | undefined;
  view: { rows: ResultRow[]; cautions: string[] } | undefined;
  children?: ComponentChildren;
}

export function ResultsCard({ id, error, view, children }: ResultsCardProps) {
  const t = useT();
  return (
    <section class="card" aria-labelledby={id}>
      <h2 id={id}>{t('app.common.results')}</h2>
      <ErrorNote message={error} />
      {!view && !error && <p class="note">{t('app.common.fixInputs')}</p>}
      {view && <ResultList rows={view.rows} label={t('app.common.results')} />}
      {view && <Cautions title={t('app.common.cautions')} messages={view.cautions} />}
      {children}
      <p class="note">{t('app.common.estimateNote')}</p>
    </section>
  );
}
