/** A job's plan, prediction, lab result and comparison as worded result rows (kept out of the JSX). */
import type { TFunction } from 'i18next';
import {
  ecdComparison,
  type Hardness,
  type Job,
  type JobInputs,
  type LabResult,
  type Prediction,
  type Steel,
} from '../../jobs';
import { speedParams } from '../fields/calibrationWords';
import { formatQuantity } from '../ui/format';
import type { ResultRow } from '../ui/ResultList';
import type { Show } from '../ui/show';
import { formatMoment } from './dates';

export interface Wording {
  t: TFunction;
  show: Show;
  locale: string;
}

const row = (key: string, label: string, value: string, detail?: string): ResultRow => ({
  key,
  label,
  value,
  ...(detail ? { detail } : {}),
});
/** A row whose value is words (may wrap), not a figure. */
const wordRow = (key: string, label: string, value: string, detail?: string): ResultRow => ({
  ...row(key, label, value, detail),
  text: true,
});

/** The steel and what the calculator was asked. */
export function planRows(
  steel: Pick<Steel, 'coreCarbonPct'> & { gradeName?: string | undefined },
  inputs: JobInputs | undefined,
  { t, show }: Wording,
): ResultRow[] {
  const rows: ResultRow[] = [];
  if (inputs) rows.push(wordRow('kind', t('app.log.plan.kind'), t(`jobs.inputKind.${inputs.kind}`)));
  if (steel.gradeName) rows.push(wordRow('steel', t('app.steel.grade'), steel.gradeName));
  rows.push(row('core', t('app.fields.coreCarbon'), show.carbon(steel.coreCarbonPct)));
  if (!inputs) return rows;
  if (inputs.kind === 'cycle') {
    const steps = inputs.recipe.steps;
    const totalH = steps.reduce((sum, s) => sum + s.durationH, 0);
    // A soak may be stored with its start temperature only.
    const hottestC = Math.max(...steps.map((s) => Math.max(s.startTempC, s.endTempC ?? s.startTempC)));
    rows.push(
      row(
        'steps',
        t('app.log.plan.steps'),
        String(steps.length),
        t('app.log.plan.stepsDetail', { time: show.hoursMinutes(totalH), temperature: show.temperature(hottestC) }),
      ),
    );
    return rows;
  }
  if ('temperatureC' in inputs)
    rows.push(row('temperature', t('app.fields.temperature'), show.temperature(inputs.temperatureC)));
  if ('timeH' in inputs)
    rows.push(row('time', t('app.fields.time'), show.time(inputs.timeH), show.hoursMinutes(inputs.timeH)));
  if ('targetDepthMm' in inputs)
    rows.push(row('target', t('app.fields.targetDepth'), show.depth(inputs.targetDepthMm)));
  if (inputs.carbonPotentialPct !== undefined)
    rows.push(row('potential', t('app.fields.carbonPotential'), show.carbon(inputs.carbonPotentialPct)));
  if (inputs.surfaceCarbonPct !== undefined)
    rows.push(row('surfaceSet', t('app.fields.surfaceCarbon'), show.carbon(inputs.surfaceCarbonPct)));
  if (inputs.thresholdCarbonPct !== undefined)
    rows.push(row('threshold', t('app.fields.threshold'), show.carbon(inputs.thresholdCarbonPct)));
  // Predicted with a furnace's depth correction: the record says so.
  if (inputs.diffusivityFactor !== undefined && inputs.diffusivityFactor !== 1) {
    rows.push(
      row(
        'factor',
        t('app.calibration.factor'),
        t('app.calibration.factorValue', speedParams(show, inputs.diffusivityFactor)),
      ),
    );
  }
  return rows;
}

/** The prediction as it was made (with the answer of a time or temperature request). */
export function predictionRows(
  prediction: Prediction,
  kind: JobInputs['kind'] | undefined,
  { t, show }: Wording,
): ResultRow[] {
  const rows: ResultRow[] = [
    { ...row('ecd', t('app.log.prediction.ecd'), show.depth(prediction.effectiveCaseDepthMm)), main: true },
  ];
  if (prediction.ecdBandMm)
    rows.push(
      row(
        'band',
        t('app.log.prediction.band'),
        show.depthRange(prediction.ecdBandMm.minMm, prediction.ecdBandMm.maxMm),
      ),
    );
  if (kind === 'time' && prediction.timeH !== undefined)
    rows.push(row('time', t('app.depth.timeNeeded'), show.time(prediction.timeH), show.hoursMinutes(prediction.timeH)));
  if (kind === 'cycle' && prediction.timeH !== undefined)
    rows.push(row('time', t('app.cycle.cycleTime'), show.time(prediction.timeH), show.hoursMinutes(prediction.timeH)));
  if (kind === 'temperature' && prediction.temperatureC !== undefined)
    rows.push(row('temperature', t('app.depth.temperatureNeeded'), show.temperature(prediction.temperatureC)));
  rows.push(row('total', t('app.log.prediction.total'), show.depth(prediction.totalCaseDepthMm)));
  rows.push(row('surface', t('app.depth.surfaceCarbon'), show.carbon(prediction.surfaceCarbonPct)));
  rows.push(
    wordRow(
      'model',
      t('app.settings.model'),
      t(`app.models.${prediction.model}`),
      t('app.log.prediction.appVersion', { version: prediction.appVersion }),
    ),
  );
  return rows;
}

export function hardnessText(hardness: Hardness, locale: string): string {
  return formatQuantity(hardness.value, hardness.unit, locale, hardness.unit === 'HRC' ? 1 : 0);
}

/** What the lab measured. */
export function labRows(lab: LabResult, { t, show, locale }: Wording): ResultRow[] {
  const rows: ResultRow[] = [];
  if (lab.ecdMm !== undefined) rows.push({ ...row('ecd', t('app.log.lab.ecd'), show.depth(lab.ecdMm)), main: true });
  if (lab.surfaceHardness)
    rows.push(row('surfaceHardness', t('app.log.lab.surfaceHardness'), hardnessText(lab.surfaceHardness, locale)));
  if (lab.coreHardness)
    rows.push(row('coreHardness', t('app.log.lab.coreHardness'), hardnessText(lab.coreHardness, locale)));
  if (lab.surfaceCarbonPct !== undefined)
    rows.push(row('surfaceCarbon', t('app.log.lab.surfaceCarbon'), show.carbon(lab.surfaceCarbonPct)));
  if (lab.by) rows.push(wordRow('by', t('app.log.lab.by'), lab.by));
  if (lab.measuredAt) rows.push(wordRow('at', t('app.log.lab.at'), formatMoment(lab.measuredAt, locale)));
  return rows;
}

/** A signed percentage, e.g. "+3.6 %". */
export function signedPercent(pct: number, locale: string): string {
  const text = formatQuantity(pct, 'pct', locale, 1);
  return pct > 0 && !text.startsWith('\u2212') ? `+${text}` : text;
}

/** Predicted against measured, when both are known. */
export function comparisonRows(job: Job, { t, show, locale }: Wording): ResultRow[] {
  const pair = ecdComparison(job);
  if (!pair) return [];
  const rows = [
    row(
      'difference',
      t('app.log.compare.difference'),
      show.depthChange(pair.differenceMm),
      signedPercent(pair.differencePct, locale),
    ),
  ];
  if (pair.withinBand !== undefined)
    rows.push(
      wordRow(
        'band',
        t('app.log.compare.band'),
        pair.withinBand ? t('app.log.compare.inside') : t('app.log.compare.outside'),
      ),
    );
  return rows;
}
