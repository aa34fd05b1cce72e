/**
 * The plant's own hardness limit: per furnace and steel grade, the carbon at which that steel
 * reaches the case criterion there, learnt from the traverses beside the predicted profiles of the
 * same loads, with the diffusion speed fitted with it; the method in words; a switch to use it for
 * that grade's calculations in that furnace (off until turned on). Fitted in the physics worker.
 */
import { useEffect, useMemo } from 'preact/hooks';
import type { Job, PlantThreshold } from '../../jobs';
import { errorMessage } from '../../i18n/i18n';
import { CASE_END_FRACTION, MIN_THRESHOLD_LOADS, type PlantThresholdFit } from '../../physics';
import { speedParams } from '../fields/calibrationWords';
import { gradeName } from '../fields/learntWords';
import { plantThresholds, setThresholdApplied, storeThreshold, type StoredThreshold } from '../settings/plantThreshold';
import { useScreenContext, type ScreenContext } from '../settings/screenContext';
import { hrefFor } from '../shell/route';
import { ErrorNote } from '../ui/Notices';
import { PairsTable } from './PairsTable';
import { ResultList, type ResultRow } from '../ui/ResultList';
import { CheckField } from '../ui/TextField';
import { latestRun } from '../worker/client';
import type { ThresholdInput } from '../worker/tasks';

const thresholdKey = ({ jobs, model }: ThresholdInput) =>
  [model, ...jobs.map((job) => `${job.id}@${job.updatedAt}`)].join('|');

/** A fit as the figures the settings keep. */
export function storableThreshold(
  found: PlantThreshold,
  fit: PlantThresholdFit,
  model: StoredThreshold['model'],
  fittedAt: string,
  apply: boolean,
): StoredThreshold {
  return {
    furnace: found.furnace,
    grade: found.grade,
    thresholdPct: fit.thresholdCarbonPct,
    low: fit.thresholdInterval95.low,
    high: fit.thresholdInterval95.high,
    factor: fit.factor,
    factorLow: fit.factorInterval95.low,
    factorHigh: fit.factorInterval95.high,
    loadCount: fit.loadCount,
    fittedAt,
    model,
    apply,
  };
}

export function ThresholdView({ jobs, model }: { jobs: readonly Job[]; model: StoredThreshold['model'] }) {
  const ctx = useScreenContext();
  const { t } = ctx;
  const fits = useMemo(() => latestRun('plantThresholds', thresholdKey), []);
  const traversed = useMemo(() => jobs.filter((job) => job.lab?.traverse), [jobs]);
  useEffect(() => {
    fits.run({ jobs: traversed, model });
  }, [fits, traversed, model]);
  const answer = fits.answer.value;
  const found = answer && 'output' in answer ? answer.output : [];
  const byId = useMemo(() => new Map(jobs.map((job) => [job.id, job])), [jobs]);
  return (
    <section class="threshold-section" aria-labelledby="threshold-title">
      <h2 id="threshold-title">{t('app.plantThreshold.title')}</h2>
      <p class="note">
        {t('app.plantThreshold.method', {
          share: ctx.show.number(CASE_END_FRACTION * 100, 0),
          min: MIN_THRESHOLD_LOADS,
        })}
      </p>
      {fits.updating.value && (
        <p class="updating-mark" data-updating>
          {t('app.common.updating')}
        </p>
      )}
      {!fits.updating.value && answer && found.length === 0 && (
        <p class="note">{t('app.plantThreshold.noTraverses')}</p>
      )}
      {found.map((f) => (
        <ThresholdCard key={`${f.furnace}|${f.grade}`} found={f} model={model} byId={byId} ctx={ctx} />
      ))}
    </section>
  );
}

function ThresholdCard({
  found,
  model,
  byId,
  ctx,
}: {
  found: PlantThreshold;
  model: StoredThreshold['model'];
  byId: ReadonlyMap<string, Job>;
  ctx: ScreenContext;
}) {
  const { t, show } = ctx;
  const { furnace, fit } = found;
  const grade = gradeName(found.grade);
  const stored = plantThresholds.value.find((s) => s.furnace === furnace && s.grade === found.grade);
  const id = `threshold-${`${furnace}-${found.grade}`.replace(/[^\w-]/gu, '_')}`;
  const rows: ResultRow[] = fit.ok
    ? [
        {
          key: 'threshold',
          label: t('app.plantThreshold.threshold'),
          value: show.carbon(fit.value.thresholdCarbonPct),
          detail: t('app.plantThreshold.interval', {
            low: show.carbon(fit.value.thresholdInterval95.low),
            high: show.carbon(fit.value.thresholdInterval95.high),
          }),
          main: true,
        },
        {
          key: 'speed',
          label: t('app.plantThreshold.speed'),
          value: t('app.calibration.factorValue', speedParams(show, fit.value.factor)),
          detail: t('app.plantThreshold.interval', {
            low: show.number(fit.value.factorInterval95.low, 2),
            high: show.number(fit.value.factorInterval95.high, 2),
          }),
          text: true,
        },
        { key: 'loads', label: t('app.plantThreshold.loads'), value: String(fit.value.loadCount) },
      ]
    : [];
  const apply = (on: boolean) => {
    if (fit.ok) storeThreshold(storableThreshold(found, fit.value, model, new Date().toISOString(), on));
    else setThresholdApplied(furnace, found.grade, on);
  };
  return (
    <section
      class="card threshold-card"
      aria-labelledby={`${id}-title`}
      data-furnace={furnace}
      data-grade={found.grade}
    >
      <h3 id={`${id}-title`}>{t('app.plantThreshold.cardHeading', { grade, furnace })}</h3>
      {!fit.ok && <ErrorNote message={errorMessage(t, fit.error)} />}
      {fit.ok && <ResultList rows={rows} label={t('app.plantThreshold.cardHeading', { grade, furnace })} />}
      {found.skipped.length > 0 && (
        <div class="calibration-left-out">
          <p class="note">{t('app.calibration.leftOut', { count: found.skipped.length })}</p>
          <ul>
            {found.skipped.map(({ id: jobId, reason }) => (
              <li key={jobId}>
                <a href={hrefFor('log', 'job', jobId)}>{byId.get(jobId)?.partNumber ?? jobId.slice(0, 8)}</a>:{' '}
                {reason === 'noCaseEnd'
                  ? t('app.plantThreshold.noCaseEnd')
                  : t(`app.calibration.leftOutReason.${reason}`)}
              </li>
            ))}
          </ul>
        </div>
      )}
      {(fit.ok || stored) && (
        <CheckField
          id={`${id}-apply`}
          label={t('app.plantThreshold.apply', {
            threshold: fit.ok ? show.carbon(fit.value.thresholdCarbonPct) : show.carbon(stored!.thresholdPct),
            grade,
            furnace,
          })}
          checked={stored?.apply ?? false}
          onChange={apply}
        />
      )}
      {fit.ok && <ThresholdResiduals fit={fit.value} byId={byId} ctx={ctx} />}
    </section>
  );
}

function ThresholdResiduals({
  fit,
  byId,
  ctx,
}: {
  fit: PlantThresholdFit;
  byId: ReadonlyMap<string, Job>;
  ctx: ScreenContext;
}) {
  const { t, show } = ctx;
  return (
    <details class="disclosure">
      <summary>{t('app.calibration.residualsHeading', { count: fit.residuals.length })}</summary>
      <PairsTable
        caption={t('app.plantThreshold.residualsCaption')}
        columns={[t('app.plantThreshold.colEcd'), t('app.plantThreshold.colCaseEnd')]}
        rows={fit.residuals.map((r) => ({
          id: r.id,
          title: byId.get(r.id)?.partNumber ?? r.id.slice(0, 8),
          cells: [
            `${show.depth(r.measuredEcdMm)} / ${show.depth(r.predictedEcdMm)}`,
            `${show.depth(r.measuredCaseEndMm)} / ${show.depth(r.predictedCaseEndMm)}`,
          ],
        }))}
      />
      <p class="note">{t('app.plantThreshold.residualsNote')}</p>
    </details>
  );
}
