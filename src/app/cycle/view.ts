/** The cycle screen's worded results and chart data (kept out of the JSX). */
import type { TFunction } from 'i18next';
import { findGradeByIdOrName, type IndicativeHardnessBasis } from '../../physics';
import { ecdLabel } from '../fields/ecdLabel';
import { resultCalibrationWords } from '../fields/learntWords';
import type { ResultRow } from '../ui/ResultList';
import type { Show } from '../ui/show';
import { stepCautions } from '../ui/warningText';
import type { DisplayUnits } from '../ui/units';
import type { HistoryChartData, ProfileChartData } from './chart';
import { historyChartData, profileChartData } from './chartData';
import type { CycleResult } from './results';

export interface CycleView {
  answer: string;
  /** The calibration applied, in short, under the answer. */
  answerNote?: string;
  rows: ResultRow[];
  cautions: string[];
  chart: ProfileChartData;
  history: HistoryChartData;
  /** How the indicative hardness curve is drawn, with its anchors. */
  hardnessMethod: string;
}

/** Where a given core hardness came from: typed with the steel, or the lab's traverse. */
export type GivenCore = 'steel' | 'lab';

function coreSourceWords(
  basis: IndicativeHardnessBasis,
  grade: string | undefined,
  t: TFunction,
  given: GivenCore,
): string {
  const listed = grade === undefined ? undefined : findGradeByIdOrName(grade);
  if (basis.coreSource === 'grade' && listed) return t('app.cycle.coreSource.grade', { grade: listed.name });
  return t(basis.coreSource === 'steel' ? `app.cycle.coreSource.${given}` : 'app.cycle.coreSource.default');
}

/** The method of the indicative hardness in words, with the figures it was drawn through. */
export function hardnessMethodText(
  basis: IndicativeHardnessBasis,
  grade: string | undefined,
  t: TFunction,
  show: Show,
  given: GivenCore = 'steel',
): string {
  return t('app.cycle.hardnessMethod', {
    core: show.hardness({ value: basis.coreHardnessHrc, unit: 'HRC' }),
    coreSource: coreSourceWords(basis, grade, t, given),
    limit: show.hardness(basis.limit),
    limitHrc: show.hardness({ value: basis.limitHrc, unit: 'HRC' }, 1),
    threshold: show.carbon(basis.thresholdCarbonPct),
  });
}

export function cycleView(
  { recipe, simulation, calibration }: CycleResult,
  t: TFunction,
  show: Show,
  units: DisplayUnits,
): CycleView {
  const totalH = recipe.steps.reduce((sum, s) => sum + s.durationH, 0);
  const threshold = recipe.thresholdCarbonPct ?? 0;
  const calibrated = resultCalibrationWords(calibration, t, show);
  const basis = simulation.hardnessBasis;
  return {
    answer: show.depth(simulation.effectiveCaseDepthMm),
    ...(calibrated?.short ? { answerNote: calibrated.short } : {}),
    rows: [
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
        key: 'ecd',
        label: ecdLabel(t, show, threshold, basis.limit),
        value: show.depth(simulation.effectiveCaseDepthMm),
        main: true,
      },
      { key: 'total', label: t('app.cycle.totalCase'), value: show.depth(simulation.totalCaseDepthMm) },
      { key: 'surface', label: t('app.depth.surfaceCarbon'), value: show.carbon(simulation.surfaceCarbonPct) },
      { key: 'duration', label: t('app.cycle.cycleTime'), value: show.time(totalH), detail: show.hoursMinutes(totalH) },
    ],
    cautions: stepCautions(simulation.warnings, t, show),
    chart: profileChartData(simulation, recipe, t, show, units),
    history: historyChartData(simulation, t, show, units),
    hardnessMethod: hardnessMethodText(basis, recipe.steel.grade, t, show),
  };
}
