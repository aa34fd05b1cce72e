/** The depth screen's result rows, worded and formatted (kept out of the JSX). */
import type { TFunction } from 'i18next';
import { DIFFUSIVITY_MODELS, MODEL_IDS } from '../../physics';
import { bandRow } from '../range/band';
import { calibrationWords } from '../fields/calibrationWords';
import { ecdLabel } from '../fields/ecdLabel';
import type { ResultRow } from '../ui/ResultList';
import type { Show } from '../ui/show';
import { wordWarning } from '../ui/warningText';
import type { DepthResult } from './results';

export interface DepthView {
  answerLabel: string;
  answer: string;
  answerDetail?: string;
  /** The calibration applied, in short, under the answer. */
  answerNote?: string;
  rows: ResultRow[];
  cautions: string[];
}

export function depthView(result: DepthResult, t: TFunction, show: Show, marginPct: number): DepthView {
  const f = result.figures;
  const calibration = calibrationWords(result.calibration, t, show);
  const calibrationRows: ResultRow[] = calibration
    ? [{ key: 'calibration', label: t('app.calibration.label'), value: calibration.sentence, text: true }]
    : [];
  const band = bandRow(f.uncertaintyMm, t, show);
  const answerNote = calibration?.short;
  const byModel = MODEL_IDS.map((id) => `${t(`app.models.${id}`)} ${show.depth(f.modelRangeMm.byModel[id])}`).join(
    ' · ',
  );
  const ecdRow: ResultRow = {
    key: 'ecd',
    label: ecdLabel(t, show, f.thresholdCarbonPct, result.ecdHardnessLimit),
    value: show.depth(f.effectiveCaseDepthMm),
  };
  const common: ResultRow[] = [
    {
      key: 'total',
      label: t('app.depth.totalCase', { margin: show.carbon(marginPct) }),
      value: show.depth(f.totalCaseDepthMm),
    },
    { key: 'sqrtDt', label: t('app.depth.sqrtDt'), value: show.depth(f.sqrtDtMm), detail: t('app.depth.sqrtDtDetail') },
    {
      key: 'harris',
      label: t('app.depth.harris'),
      value: show.depth(f.harrisDepthMm),
      detail: t('app.depth.harrisDetail'),
    },
    {
      key: 'diffusivity',
      label: t('app.depth.diffusivity'),
      value: show.diffusivity(f.diffusivityM2PerS),
      detail: DIFFUSIVITY_MODELS[f.model].source,
    },
    {
      key: 'modelRange',
      label: t('app.depth.modelRange'),
      value: show.depthRange(f.modelRangeMm.min, f.modelRangeMm.max),
      detail: byModel,
    },
    {
      key: 'sensitivity',
      label: t('app.depth.sensitivity', { step: show.temperatureDifference(f.temperatureSensitivity.stepC) }),
      value: `${show.depthChange(f.temperatureSensitivity.minusMm - f.effectiveCaseDepthMm)} / ${show.depthChange(
        f.temperatureSensitivity.plusMm - f.effectiveCaseDepthMm,
      )}`,
      detail: t('app.depth.sensitivityDetail'),
    },
    {
      key: 'surface',
      label: t('app.depth.surfaceCarbon'),
      value: show.carbon(f.surfaceCarbonPct),
      detail: t('app.depth.alloyFactor', {
        factor: show.number(f.alloyFactor, 3),
        potential: show.carbon(f.carbonPotentialPct),
      }),
    },
    {
      key: 'hardness',
      label: t('app.depth.hardness'),
      value: `≈ ${show.hardnessHrc(f.surfaceHardnessHrc)}`,
      detail: t('app.depth.hardnessDetail', { hv: show.hardnessHv(f.surfaceHardnessHrc) }),
    },
  ];
  const cautions = f.warnings.map((w) => wordWarning(t, w, show));
  if (result.solveFor === 'time') {
    return {
      answerLabel: t('app.depth.answerTime', { depth: show.depth(result.figures.targetDepthMm) }),
      answer: show.hoursMinutes(f.timeH),
      answerDetail: show.time(f.timeH),
      answerNote,
      rows: [
        ...calibrationRows,
        {
          key: 'time',
          label: t('app.depth.timeNeeded'),
          value: show.time(f.timeH),
          detail: show.hoursMinutes(f.timeH),
          main: true,
        },
        {
          key: 'timeRange',
          label: t('app.depth.timeRange'),
          value: show.timeRange(result.figures.modelRangeH.min, result.figures.modelRangeH.max),
        },
        band,
        ...common,
      ],
      cautions,
    };
  }
  if (result.solveFor === 'temperature') {
    const range = result.figures.modelRangeC;
    return {
      answerLabel: t('app.depth.answerTemperature', { depth: show.depth(result.figures.targetDepthMm) }),
      answer: show.temperature(f.temperatureC),
      answerNote,
      rows: [
        ...calibrationRows,
        {
          key: 'temperature',
          label: t('app.depth.temperatureNeeded'),
          value: show.temperature(f.temperatureC),
          main: true,
        },
        {
          key: 'temperatureRange',
          label: t('app.depth.temperatureRange'),
          value: range ? show.temperatureRange(range.min, range.max) : t('app.depth.temperatureRangeNone'),
        },
        band,
        ...common,
      ],
      cautions,
    };
  }
  return {
    answerLabel: t('app.depth.answerDepth'),
    answer: show.depth(f.effectiveCaseDepthMm),
    answerDetail: t('app.band.likely', { range: band.value }),
    answerNote,
    rows: [...calibrationRows, { ...ecdRow, main: true }, band, ...common],
    cautions,
  };
}
