/** Shift handover: the loads earlier shifts left open, shown at the head of the shift running now. */
import { carriedOverLoads, OPEN_STATUSES, type Job, type JobFilter } from '../../jobs';
import { useScreenContext } from '../settings/screenContext';
import { isCurrentShift, type FilterForm } from './filter';
import { JobCard } from './JobCard';
import { currentShift, shiftConfig } from './shifts';
import { useJobList } from './useLog';

// Dates that cannot meet: the store answers at once with nothing (hooks cannot be skipped).
const NO_JOBS: JobFilter = { fromDate: '9999-12-31', toDate: '0000-01-01' };

/** Open loads from before the shift running now, when the filter shows exactly that shift. */
export function useCarriedOver(form: FilterForm, now: Date = new Date()): Job[] {
  const current = isCurrentShift(form, now);
  const list = useJobList(current ? { status: OPEN_STATUSES, toDate: form.toDate } : NO_JOBS);
  if (!current || list.state !== 'ready') return [];
  return carriedOverLoads(list.value.jobs, currentShift(now), shiftConfig.value);
}

/** The loads earlier shifts left open, at the head of the shift running now. */
export function CarriedOver({ jobs, headingId }: { jobs: readonly Job[]; headingId: string }) {
  const { t, show, locale } = useScreenContext();
  if (jobs.length === 0) return null;
  return (
    <section class="card carried-over" aria-labelledby={headingId}>
      <h2 id={headingId}>{t('app.log.list.carriedHeading')}</h2>
      <p class="note">{t('app.log.list.carriedNote', { count: jobs.length })}</p>
      <ul class="card-stack">
        {jobs.map((job) => (
          <JobCard key={job.id} job={job} t={t} show={show} locale={locale} />
        ))}
      </ul>
    </section>
  );
}
