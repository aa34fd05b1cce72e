/** The cycle screen's worded results and chart data (kept out of the JSX). */
import type { TFunction } from 'i18next';
import { convert } from '../../physics';
import { calibrationWords } from '../fields/calibrationWords';
import { UNIT_SYMBOLS } from '../ui/format';
import type { ResultRow } from '../ui/ResultList';
import type { Show } from '../ui/show';
import { stepCautions } from '../ui/warningText';
import type { DisplayUnits } from '../ui/units';
import type { ProfileChartData } from './chart';
import type { CycleResult } from './results';

export interface CycleView {
  answer: string;
  /** The calibration applied, in short, under the answer. */
  answerNote?: string;
  rows: ResultRow[];
  cautions: string[];
  chart: ProfileChartData;
}

const toUnit = (mm: number, unit: string) => {
  const r = convert(mm, 'mm', unit);
  return r.ok ? r.value : Number.NaN;
};

export function cycleView(
  { recipe, simulation, calibration }: CycleResult,
  t: TFunction,
  show: Show,
  units: DisplayUnits,
): CycleView {
  const totalH = recipe.steps.reduce((sum, s) => sum + s.durationH, 0);
  const threshold = recipe.thresholdCarbonPct ?? 0;
  const calibrated = calibrationWords(calibration, t, show);
  return {
    answer: show.depth(simulation.effectiveCaseDepthMm),
    ...(calibrated?.short ? { answerNote: calibrated.short } : {}),
    rows: [
      ...(calibrated
        ? [{ key: 'calibration', label: t('app.calibration.label'), value: calibrated.sentence, text: true }]
        : []),
      {
        key: 'ecd',
        label: t('app.depth.ecd', { threshold: show.carbon(threshold) }),
        value: show.depth(simulation.effectiveCaseDepthMm),
        main: true,
      },
      { key: 'total', label: t('app.cycle.totalCase'), value: show.depth(simulation.totalCaseDepthMm) },
      { key: 'surface', label: t('app.depth.surfaceCarbon'), value: show.carbon(simulation.surfaceCarbonPct) },
      { key: 'duration', label: t('app.cycle.cycleTime'), value: show.time(totalH), detail: show.hoursMinutes(totalH) },
    ],
    cautions: stepCautions(simulation.warnings, t, show),
    chart: {
      depth: simulation.profile.map((p) => toUnit(p.depthMm, units.depth)),
      carbonPct: simulation.profile.map((p) => p.carbonPct),
      hardnessHrc: simulation.profile.map((p) => p.hardnessHrc),
      thresholdPct: threshold,
      ecd: toUnit(simulation.effectiveCaseDepthMm, units.depth),
      labels: {
        depth: t('app.cycle.chartDepth', { unit: units.depth }),
        carbon: t('app.cycle.chartCarbon'),
        hardness: t('app.cycle.chartHardness'),
        threshold: t('app.cycle.chartThreshold', { threshold: show.carbon(threshold) }),
        ecd: t('app.cycle.chartEcd'),
        carbonAxis: UNIT_SYMBOLS.pctC!,
        hardnessAxis: UNIT_SYMBOLS.HRC!,
      },
    },
  };
}
