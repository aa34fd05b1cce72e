/** A job in a list: one large link to its page with work order, part, furnace, status and depths. */
import { measuredEcdMm, type Job } from '../../jobs';
import { hrefFor } from '../shell/route';
import type { Show } from '../ui/show';
import type { TFunction } from 'i18next';
import { StrokeIcon } from '../ui/Icon';
import { formatClockTime } from './dates';

/**
 * A shape for each status beside its colour, so no two statuses look alike in any theme or to a
 * colour-blind eye: planned an open circle, in furnace a flame, done a tick, on hold a pause, rejected a cross.
 */
const STATUS_SHAPES: Record<Job['status'], string> = {
  planned: 'M12 5.5a6.5 6.5 0 1 0 0 13a6.5 6.5 0 1 0 0-13z',
  inFurnace: 'M12 3c1 4 5 5.5 5 10a5 5 0 0 1-10 0c0-2.5 1.5-3.5 2.5-5c.5 2 1.5 2.5 2.5 3c.5-2.5 0-5.5 0-8z',
  done: 'M5 12.5l4.5 4.5L19 7.5',
  onHold: 'M9 6v12M15 6v12',
  rejected: 'M6.5 6.5l11 11M17.5 6.5l-11 11',
};

export function StatusBadge({ status, t }: { status: Job['status']; t: TFunction }) {
  return (
    <span class={`status-badge status-${status}`} data-status={status}>
      <StrokeIcon path={STATUS_SHAPES[status]} />
      {t(`jobs.status.${status}`)}
    </span>
  );
}

export function JobCard({ job, t, show, locale }: { job: Job; t: TFunction; show: Show; locale: string }) {
  const predicted = job.prediction ? show.depth(job.prediction.effectiveCaseDepthMm) : undefined;
  const measuredMm = measuredEcdMm(job);
  const measured = measuredMm === undefined ? undefined : show.depth(measuredMm);
  return (
    <li>
      <a class="job-card" href={hrefFor('log', 'job', job.id)} data-job={job.id}>
        <span class="job-card-top">
          <span class="job-card-title">{job.workOrder || job.partNumber}</span>
          <StatusBadge status={job.status} t={t} />
        </span>
        <span class="job-card-line">
          {[
            job.workOrder ? job.partNumber : '',
            job.furnace,
            job.operator,
            `${job.shift} ${formatClockTime(job.createdAt, locale)}`,
          ]
            .filter(Boolean)
            .join(' · ')}
        </span>
        {(predicted || measured) && (
          <span class="job-card-line job-card-depths">
            {predicted && t('app.log.list.predicted', { depth: predicted })}
            {predicted && measured && ' · '}
            {measured && t('app.log.list.measured', { depth: measured })}
          </span>
        )}
      </a>
    </li>
  );
}
