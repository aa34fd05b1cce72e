/** The job log screen: the list (opens on the current shift), one job, the shift summary, and files. */
import { useEffect, useRef } from 'preact/hooks';
import { useT } from '../../i18n/useT';
import { hrefFor, subPath } from '../shell/route';
import { persistence, refreshPersistence } from './db';
import { CalibrationView } from './CalibrationView';
import { DetailView } from './DetailView';
import { followCurrentShift } from './filter';
import { FilesView } from './FilesView';
import { ListView } from './ListView';
import { SummaryView } from './SummaryView';
import './log.css';

const VIEWS = ['list', 'summary', 'files'] as const;
/** Views without a tab of their own: one job (under the list) and furnace calibration (under the summary). */
type View = (typeof VIEWS)[number] | 'job' | 'calibration';

function viewOf(path: readonly string[]): { view: View; jobId?: string } {
  if (path[0] === 'job' && path[1]) return { view: 'job', jobId: path[1] };
  if (path[0] === 'summary' || path[0] === 'calibration' || path[0] === 'files') return { view: path[0] };
  return { view: 'list' };
}

export default function LogScreen() {
  const t = useT();
  const { view, jobId } = viewOf(subPath.value);
  const shownKey = `${view}/${jobId ?? ''}`;
  const previousKeyRef = useRef(shownKey);
  useEffect(() => {
    followCurrentShift();
    void refreshPersistence();
  }, []);
  useEffect(() => {
    // Moving between the log's views: start at the top, focus on the new heading.
    if (previousKeyRef.current === shownKey) return;
    previousKeyRef.current = shownKey;
    window.scrollTo(0, 0);
    requestAnimationFrame(() => document.querySelector<HTMLElement>('main h1')?.focus());
  }, [shownKey]);
  const tab = view === 'job' ? 'list' : view === 'calibration' ? 'summary' : view;
  return (
    <div class="screen log">
      <nav class="view-tabs" aria-label={t('app.log.tabs.label')}>
        {VIEWS.map((v) => (
          <a
            key={v}
            href={v === 'list' ? hrefFor('log') : hrefFor('log', v)}
            aria-current={tab === v ? 'page' : undefined}
          >
            {t(`app.log.tabs.${v}`)}
          </a>
        ))}
      </nav>
      {view === 'job' && jobId ? (
        <DetailView id={jobId} />
      ) : view === 'summary' ? (
        <SummaryView />
      ) : view === 'calibration' ? (
        <CalibrationView />
      ) : view === 'files' ? (
        <FilesView />
      ) : (
        <ListView />
      )}
      {persistence.value && (
        <p class="note log-persistence" data-persistence={persistence.value}>
          {t(`jobs.persist.${persistence.value}`)}
        </p>
      )}
    </div>
  );
}
