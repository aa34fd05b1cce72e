/** The log: opens on the shift running now; newest first; damaged records reported above the list. */
import { signal } from '@preact/signals';
import { useEffect, useState } from 'preact/hooks';
import { describeJobsError, type Job } from '../../jobs';
import { ErrorNote } from '../ui/Notices';
import { useScreenContext } from '../settings/screenContext';
import { DamagedRecords } from './DamagedRecords';
import { filterForm, toJobFilter } from './filter';
import { FilterPanel } from './FilterPanel';
import { JobCard } from './JobCard';
import { useLogPicks } from './picks';
import { CarriedOver, useCarriedOver } from './handover';
import { useJobList } from './useLog';

/** Jobs drawn at once; more on request, so a year of log stays quick on a phone. */
const PAGE = 50;

/** Furnaces and parts met in the log this session (the filter offers them, with the recent ones). */
const seen = signal<{ furnaces: string[]; parts: string[] }>({ furnaces: [], parts: [] });

function remember(jobs: readonly Job[]): void {
  const furnaces = new Set(seen.value.furnaces);
  const parts = new Set(seen.value.parts);
  for (const job of jobs) {
    furnaces.add(job.furnace);
    parts.add(job.partNumber);
  }
  if (furnaces.size !== seen.value.furnaces.length || parts.size !== seen.value.parts.length) {
    seen.value = { furnaces: [...furnaces].sort(), parts: [...parts].sort() };
  }
}

export function ListView() {
  const ctx = useScreenContext();
  const { t, show, locale } = ctx;
  const filter = toJobFilter(filterForm.value);
  const filterKey = JSON.stringify(filter);
  const list = useJobList(filter);
  const [shown, setShown] = useState(PAGE);
  useEffect(() => setShown(PAGE), [filterKey]);
  useEffect(() => {
    if (list.state === 'ready') remember(list.value.jobs);
  }, [list]);
  const jobs = list.state === 'ready' ? list.value.jobs : [];
  const carried = useCarriedOver(filterForm.value);
  const recent = useLogPicks();
  const union = (a: readonly string[], b: readonly string[]) => [...new Set([...a, ...b])].sort();
  return (
    <>
      <h1 tabIndex={-1}>{t('app.log.title')}</h1>
      <FilterPanel
        furnaces={union(recent.furnaces, seen.value.furnaces)}
        parts={union(recent.parts, seen.value.parts)}
      />
      {list.state === 'failed' && <ErrorNote message={describeJobsError(t, list.error)} />}
      {list.state === 'ready' && <DamagedRecords records={list.value.corrupt} />}
      <CarriedOver jobs={carried} headingId="list-carried" />
      <p class="log-count" aria-live="polite">
        {list.state === 'loading' ? t('app.shell.loading') : t('app.log.list.count', { count: jobs.length })}
      </p>
      {list.state === 'ready' && jobs.length === 0 && <p class="note">{t('app.log.list.empty')}</p>}
      {jobs.length > 0 && (
        <ul class="card-stack">
          {jobs.slice(0, shown).map((job) => (
            <JobCard key={job.id} job={job} t={t} show={show} locale={locale} />
          ))}
        </ul>
      )}
      {jobs.length > shown && (
        <button type="button" class="button button-wide" onClick={() => setShown(shown + PAGE)}>
          {t('app.log.list.more', { count: Math.min(PAGE, jobs.length - shown) })}
        </button>
      )}
    </>
  );
}
