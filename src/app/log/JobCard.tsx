/** A job in a list: one large link to its page with work order, part, furnace, status and depths. */
import { measuredEcdMm, type Job } from '../../jobs';
import { hrefFor } from '../shell/route';
import type { Show } from '../ui/show';
import type { TFunction } from 'i18next';
import { formatClockTime } from './dates';

export function StatusBadge({ status, t }: { status: Job['status']; t: TFunction }) {
  return <span class={`status-badge status-${status}`}>{t(`jobs.status.${status}`)}</span>;
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
