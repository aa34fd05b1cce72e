/** The shift summary for a supervisor: loads, furnaces, open items, and predicted against lab depth. */
import { describeJobsError, JOB_STATUSES, summarizeShift, type EcdComparison, type Job } from '../../jobs';
import { NO_VALUE } from '../ui/format';
import { PairsTable } from './PairsTable';
import { ErrorNote } from '../ui/Notices';
import { ResultList } from '../ui/ResultList';
import { useScreenContext } from '../settings/screenContext';
import { hrefFor } from '../shell/route';
import { DamagedRecords } from './DamagedRecords';
import { filterForm, toJobFilter } from './filter';
import { describeFilter } from './FilterPanel';
import { JobCard } from './JobCard';
import { signedPercent } from './jobRows';
import { CarriedOver, useCarriedOver } from './handover';
import { useJobList } from './useLog';

export function SummaryView() {
  const ctx = useScreenContext();
  const { t, show, locale } = ctx;
  const form = filterForm.value;
  const filter = toJobFilter(form);
  const list = useJobList(filter);
  const jobs: Job[] = list.state === 'ready' ? list.value.jobs : [];
  const carried = useCarriedOver(form);
  const summary = summarizeShift(jobs, carried, show.depthAsShown);
  // The carried-over loads have their own section above.
  const ownOpen = summary.openItems.slice(summary.carriedOver);
  const inBand = summary.ecdPairs.filter((p) => p.withinBand === true).length;
  const withBand = summary.ecdPairs.filter((p) => p.withinBand !== undefined).length;
  return (
    <>
      <h1 tabIndex={-1}>{t('app.log.summary.title')}</h1>
      <p class="log-subtitle">
        {describeFilter(form, t, locale)} <a href={hrefFor('log')}>{t('app.log.summary.changeFilter')}</a>
      </p>
      {list.state === 'failed' && <ErrorNote message={describeJobsError(t, list.error)} />}
      {list.state === 'ready' && <DamagedRecords records={list.value.corrupt} />}
      <CarriedOver jobs={carried} headingId="summary-carried" />

      <section class="card" aria-labelledby="summary-loads">
        <h2 id="summary-loads">{t('app.log.summary.loadsHeading')}</h2>
        <div class="tiles">
          <p class="tile">
            <span class="tile-value">{summary.loads}</span>
            <span class="tile-label">{t('app.log.summary.loads', { count: summary.loads })}</span>
          </p>
          <p class="tile">
            <span class="tile-value">{summary.openItems.length}</span>
            <span class="tile-label">{t('app.log.summary.open', { count: summary.openItems.length })}</span>
          </p>
          <p class="tile">
            <span class="tile-value">{summary.ecdPairs.length}</span>
            <span class="tile-label">{t('app.log.summary.measured', { count: summary.ecdPairs.length })}</span>
          </p>
        </div>
        <ResultList
          label={t('app.log.summary.loadsHeading')}
          rows={[
            {
              key: 'furnaces',
              label: t('app.log.summary.furnaces'),
              value: summary.furnaces.join(', ') || NO_VALUE,
              text: true,
            },
            ...JOB_STATUSES.map((s) => ({ key: s, label: t(`jobs.status.${s}`), value: String(summary.byStatus[s]) })),
          ]}
        />
      </section>

      <section class="card" aria-labelledby="summary-open">
        <h2 id="summary-open">{t('app.log.summary.openHeading')}</h2>
        {ownOpen.length === 0 ? (
          <p class="note">{t(summary.carriedOver > 0 ? 'app.log.summary.noOwnOpen' : 'app.log.summary.noOpen')}</p>
        ) : (
          <ul class="card-stack">
            {ownOpen.map((job) => (
              <JobCard key={job.id} job={job} t={t} show={show} locale={locale} />
            ))}
          </ul>
        )}
      </section>

      <section class="card" aria-labelledby="summary-ecd">
        <h2 id="summary-ecd">{t('app.log.summary.ecdHeading')}</h2>
        {summary.ecdPairs.length === 0 ? (
          <p class="note">{t('app.log.summary.noPairs')}</p>
        ) : (
          <>
            <ResultList
              label={t('app.log.summary.ecdHeading')}
              rows={[
                {
                  key: 'mean',
                  label: t('app.log.summary.meanDifference'),
                  value: show.depthChange(summary.meanDifferenceMm ?? Number.NaN),
                  detail: t('app.log.summary.meanAbs', {
                    pct: signedPercent(summary.meanAbsDifferencePct ?? Number.NaN, locale).replace(/^\+/u, ''),
                  }),
                },
                ...(withBand > 0
                  ? [
                      {
                        key: 'band',
                        label: t('app.log.compare.band'),
                        value: t('app.log.summary.inBand', { inside: inBand, count: withBand }),
                        text: true,
                      },
                    ]
                  : []),
              ]}
            />
            <ComparedJobs pairs={summary.ecdPairs} />
          </>
        )}
        <p class="note">{t('app.log.summary.differenceNote')}</p>
        <a class="button" href={hrefFor('log', 'calibration')}>
          {t('app.log.summary.calibrate')}
        </a>
      </section>
    </>
  );
}

function ComparedJobs({ pairs }: { pairs: readonly EcdComparison[] }) {
  const { t, show, locale } = useScreenContext();
  return (
    <PairsTable
      caption={t('app.log.summary.tableCaption')}
      columns={[
        t('app.log.summary.colPredicted'),
        t('app.log.summary.colMeasured'),
        t('app.log.summary.colDifference'),
      ]}
      rows={pairs.map((pair) => ({
        id: pair.jobId,
        title: pair.partNumber,
        subtitle: pair.furnace,
        cells: [
          show.depth(pair.predictedMm),
          show.depth(pair.measuredMm),
          <>
            {show.depthChange(pair.differenceMm)}
            <span class="pair-detail">{signedPercent(pair.differencePct, locale)}</span>
            {pair.withinBand !== undefined && (
              <span class={pair.withinBand ? 'pair-detail pair-in' : 'pair-detail pair-out'}>
                {pair.withinBand ? t('app.log.compare.inside') : t('app.log.compare.outside')}
              </span>
            )}
          </>,
        ],
      }))}
    />
  );
}
