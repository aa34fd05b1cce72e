/** The planner's worded results: times, predictions, what binds and what would help (kept out of the JSX). */
import type { TFunction } from 'i18next';
import type { Hardness } from '../../physics';
import { resultCalibrationWords } from '../fields/learntWords';
import { ecdLabel } from '../fields/ecdLabel';
import type { ResultRow } from '../ui/ResultList';
import type { Show } from '../ui/show';
import { stepCautions, wordWarning } from '../ui/warningText';
import type { PlanOutcome } from './results';

export interface PlanView {
  reachable: boolean;
  answerLabel: string;
  answer: string;
  answerDetail: string;
  answerNote?: string;
  rows: ResultRow[];
  /** What stops the targets being met, when they are not. */
  binding?: string;
  /** What would make them reachable (estimates). */
  suggestions: string[];
  cautions: string[];
}

const timeRow = (key: string, label: string, hours: number, show: Show, main = false): ResultRow => ({
  key,
  label,
  value: show.time(hours),
  detail: show.hoursMinutes(hours),
  ...(main ? { main } : {}),
});

export function planView({ plan, request, calibration }: PlanOutcome, t: TFunction, show: Show): PlanView {
  const calibrated = resultCalibrationWords(calibration, t, show);
  const threshold = typeof request.thresholdCarbonPct === 'number' ? request.thresholdCarbonPct : Number.NaN;
  const range = plan.surfaceRangePct;
  const rows: ResultRow[] = [
    ...(calibrated
      ? [
          {
            key: 'calibration',
            label: calibrated.label ?? t('app.calibration.label'),
            value: calibrated.sentence,
            text: true,
          },
        ]
      : []),
    {
      key: 'status',
      label: t('app.plan.status'),
      value: plan.reachable ? t('app.plan.reachable') : t('app.plan.notReachable'),
      text: true,
    },
    timeRow('boost', t('app.plan.boostTime'), plan.boostH, show),
    timeRow('diffuse', t('app.plan.diffuseTime'), plan.diffuseH, show),
    ...(plan.hardeningH > 0 ? [timeRow('hardening', t('app.plan.hardeningTime'), plan.hardeningH, show)] : []),
    timeRow('total', t('app.plan.totalTime'), plan.totalH, show, true),
    {
      key: 'ecd',
      label: ecdLabel(t, show, threshold, request.ecdHardnessLimit as Hardness | undefined),
      value: show.depth(plan.predicted.effectiveCaseDepthMm),
    },
    { key: 'surface', label: t('app.depth.surfaceCarbon'), value: show.carbon(plan.predicted.surfaceCarbonPct) },
    { key: 'totalCase', label: t('app.cycle.totalCase'), value: show.depth(plan.predicted.totalCaseDepthMm) },
    ...(range
      ? [
          {
            key: 'surfaceRange',
            label: t('app.plan.surfaceRange'),
            value: show.carbonRange(range.min, range.max),
            detail: t('app.plan.surfaceRangeDetail'),
          },
        ]
      : []),
  ];
  return {
    reachable: plan.reachable,
    answerLabel: plan.reachable ? t('app.plan.answerReachable') : t('app.plan.answerMissed'),
    answer: show.hoursMinutes(plan.totalH),
    answerDetail: t('app.plan.answerDetail', {
      boost: show.hoursMinutes(plan.boostH),
      diffuse: show.hoursMinutes(plan.diffuseH),
    }),
    ...(calibrated?.short ? { answerNote: calibrated.short } : {}),
    rows,
    ...(plan.binding ? { binding: wordWarning(t, plan.binding, show) } : {}),
    suggestions: plan.suggestions.map((s) => wordWarning(t, s, show)),
    cautions: stepCautions(plan.warnings, t, show),
  };
}
