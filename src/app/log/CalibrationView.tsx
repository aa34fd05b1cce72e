/**
 * Furnace calibration: per furnace, the factor on D fitted to its lab depths, its 95 % interval,
 * the jobs and their residuals, and a switch to apply it to that furnace's predictions (off by
 * default). The figures are kept with the settings, so the calculators never open the log.
 */
import { useEffect, useMemo } from 'preact/hooks';
import { DEFAULT_CALIBRATION_JOBS, describeJobsError, type Job, type SkippedJob } from '../../jobs';
import { errorMessage } from '../../i18n/i18n';
import type { CalibrationFit } from '../../physics';
import { calibrations, setApplied, storeCalibration } from '../settings/calibration';
import { model } from '../settings/state';
import { hrefFor } from '../shell/route';
import { ErrorNote } from '../ui/Notices';
import { ResultList, type ResultRow } from '../ui/ResultList';
import { useScreenContext, type ScreenContext } from '../settings/screenContext';
import { CheckField } from '../ui/TextField';
import { speedParams } from '../fields/calibrationWords';
import { calibrationFurnaces, cardsOf, measuredJobs, type FurnaceCard } from './calibration';
import { latestRun } from '../worker/client';
import type { CalibrationInput } from '../worker/tasks';
import { formatMoment } from './dates';
import { useJobList } from './useLog';

/** A calibration input told apart by model, furnaces and each job's id and last change (not its whole text). */
const calibrationKey = ({ jobs, furnaces, model }: CalibrationInput) =>
  [model, furnaces.join('\u0000'), ...jobs.map((job) => `${job.id}@${job.updatedAt}`)].join('|');

export function CalibrationView() {
  const ctx = useScreenContext();
  const { t } = ctx;
  const list = useJobList({});
  const jobs = useMemo((): Job[] => (list.state === 'ready' ? list.value.jobs : []), [list]);
  const stored = calibrations.value;
  const current = model.value;
  // The fits re-run every lab job's prediction many times: they run in the physics worker.
  const fits = useMemo(() => latestRun('calibrate', calibrationKey), []);
  const measured = useMemo(() => measuredJobs(jobs), [jobs]);
  const furnaces = useMemo(() => calibrationFurnaces(measured, stored), [measured, stored]);
  useEffect(() => {
    if (list.state === 'ready') fits.run({ jobs: measured, furnaces, model: current });
  }, [fits, list.state, measured, furnaces, current]);
  const answer = fits.answer.value;
  const cards = useMemo(
    () => (answer && 'output' in answer ? cardsOf(answer.output, stored, answer.input.model, new Date()) : []),
    [answer, stored],
  );
  const updating = list.state === 'loading' || fits.updating.value;
  const byId = useMemo(() => new Map(jobs.map((job) => [job.id, job])), [jobs]);
  return (
    <>
      <h1 tabIndex={-1}>{t('app.calibration.title')}</h1>
      <p class="note">
        {t('app.calibration.intro', {
          count: DEFAULT_CALIBRATION_JOBS,
          model: t(`app.models.${current}`),
          neutral: ctx.show.number(1, 2),
        })}
      </p>
      {list.state === 'failed' && <ErrorNote message={describeJobsError(t, list.error)} />}
      {updating && (
        <p class="updating-mark" data-updating>
          {t('app.common.updating')}
        </p>
      )}
      {!updating && answer && cards.length === 0 && <p class="note">{t('app.calibration.noLabResults')}</p>}
      {cards.map((card) => (
        <FurnaceCalibrationCard key={card.furnace} card={card} byId={byId} ctx={ctx} />
      ))}
    </>
  );
}

function FurnaceCalibrationCard({
  card,
  byId,
  ctx,
}: {
  card: FurnaceCard;
  byId: ReadonlyMap<string, Job>;
  ctx: ScreenContext;
}) {
  const { t, show, locale } = ctx;
  const { furnace, calibration, stored, fresh, stale } = card;
  const fit = calibration.fit;
  const id = `calibration-${furnace.replace(/[^\w-]/gu, '_')}`;
  const rows: ResultRow[] = fit.ok
    ? [
        {
          key: 'factor',
          label: t('app.calibration.factor'),
          value: t('app.calibration.factorValue', speedParams(show, fit.value.factor)),
          detail: t('app.calibration.interval', {
            low: show.number(fit.value.interval95.low, 2),
            high: show.number(fit.value.interval95.high, 2),
          }),
          main: true,
          // A sentence, long in Spanish and German: it wraps instead of widening the page.
          text: true,
        },
        { key: 'jobs', label: t('app.calibration.jobs'), value: String(fit.value.jobCount) },
        { key: 'rms', label: t('app.calibration.rms'), value: show.depth(fit.value.rmsResidualMm) },
      ]
    : [];
  const apply = (on: boolean) => {
    if (!on) setApplied(furnace, false);
    else if (stored && !stale) setApplied(furnace, true);
    else if (fresh) storeCalibration({ ...fresh, apply: true });
    else if (stored) setApplied(furnace, true);
  };
  return (
    <section class="card calibration-card" aria-labelledby={`${id}-title`} data-furnace={furnace}>
      <h2 id={`${id}-title`}>{t('app.calibration.furnaceHeading', { furnace })}</h2>
      {!fit.ok && <ErrorNote message={errorMessage(t, fit.error)} />}
      {fit.ok && <ResultList rows={rows} label={t('app.calibration.furnaceHeading', { furnace })} />}
      {calibration.skipped.length > 0 && <LeftOutJobs skipped={calibration.skipped} byId={byId} ctx={ctx} />}
      {(fresh !== undefined || stored !== undefined) && (
        <CheckField
          id={`${id}-apply`}
          label={t('app.calibration.apply', { furnace })}
          checked={stored?.apply ?? false}
          onChange={apply}
        />
      )}
      {stored && stale && (
        <div class="calibration-stale">
          <p class="note">
            {t('app.calibration.storedFigures', {
              factor: show.number(stored.factor, 2),
              count: stored.jobCount,
              date: formatMoment(stored.fittedAt, locale),
              model: t(`app.models.${stored.model}`),
            })}
          </p>
          {fresh && (
            <button type="button" class="button" onClick={() => storeCalibration({ ...fresh, apply: stored.apply })}>
              {t('app.calibration.keepNew')}
            </button>
          )}
        </div>
      )}
      {fit.ok && <ResidualsTable fit={fit.value} byId={byId} ctx={ctx} />}
    </section>
  );
}

/** The measured jobs left out of the fit, each with why, so one bad record never hides the furnace's fit. */
function LeftOutJobs({
  skipped,
  byId,
  ctx,
}: {
  skipped: readonly SkippedJob[];
  byId: ReadonlyMap<string, Job>;
  ctx: ScreenContext;
}) {
  const { t } = ctx;
  return (
    <div class="calibration-left-out">
      <p class="note">{t('app.calibration.leftOut', { count: skipped.length })}</p>
      <ul>
        {skipped.map(({ id, reason }) => {
          const job = byId.get(id);
          return (
            <li key={id}>
              <a href={hrefFor('log', 'job', id)}>{job?.partNumber ?? id.slice(0, 8)}</a>
              {job?.workOrder && <span class="pair-furnace">{job.workOrder}</span>}:{' '}
              {t(`app.calibration.leftOutReason.${reason}`)}
            </li>
          );
        })}
      </ul>
    </div>
  );
}

function ResidualsTable({
  fit,
  byId,
  ctx,
}: {
  fit: CalibrationFit;
  byId: ReadonlyMap<string, Job>;
  ctx: ScreenContext;
}) {
  const { t, show } = ctx;
  return (
    <details class="disclosure">
      <summary>{t('app.calibration.residualsHeading', { count: fit.residuals.length })}</summary>
      <div class="table-wrap">
        <table class="numbers pairs">
          <caption>{t('app.calibration.residualsCaption')}</caption>
          <thead>
            <tr>
              <th scope="col">{t('app.log.summary.colJob')}</th>
              <th scope="col">{t('app.log.summary.colMeasured')}</th>
              <th scope="col">{t('app.log.summary.colPredicted')}</th>
              <th scope="col">{t('app.log.summary.colDifference')}</th>
            </tr>
          </thead>
          <tbody>
            {fit.residuals.map((r) => {
              const job = byId.get(r.id);
              return (
                <tr key={r.id}>
                  <th scope="row">
                    <a href={hrefFor('log', 'job', r.id)}>{job?.partNumber ?? r.id.slice(0, 8)}</a>
                    {job?.workOrder && <span class="pair-furnace">{job.workOrder}</span>}
                  </th>
                  <td>{show.depth(r.measuredMm)}</td>
                  <td>{show.depth(r.predictedMm)}</td>
                  <td>{show.depthChange(-r.residualMm)}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p class="note">{t('app.log.summary.differenceNote')}</p>
    </details>
  );
}
