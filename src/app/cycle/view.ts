/** The cycle screen's worded results and chart data (kept out of the JSX). */
import type { TFunction } from 'i18next';
import { warningMessage } from '../../i18n/i18n';
import { convert } from '../../physics';
import { UNIT_SYMBOLS } from '../ui/format';
import type { ResultRow } from '../ui/ResultList';
import type { Show } from '../ui/show';
import type { DisplayUnits } from '../ui/units';
import type { ProfileChartData } from './chart';
import type { CycleResult } from './results';

export interface CycleView {
  answer: string;
  rows: ResultRow[];
  cautions: string[];
  chart: ProfileChartData;
}

const toUnit = (mm: number, unit: string) => {
  const r = convert(mm, 'mm', unit);
  return r.ok ? r.value : Number.NaN;
};

export function cycleView({ recipe, simulation }: CycleResult, t: TFunction, show: Show, units: DisplayUnits): CycleView {
  const totalH = recipe.steps.reduce((sum, s) => sum + s.durationH, 0);
  const threshold = recipe.thresholdCarbonPct ?? 0;
  return {
    answer: show.depth(simulation.effectiveCaseDepthMm),
    rows: [
      { key: 'ecd', label: t('app.depth.ecd', { threshold: show.carbon(threshold) }), value: show.depth(simulation.effectiveCaseDepthMm), main: true },
      { key: 'total', label: t('app.cycle.totalCase'), value: show.depth(simulation.totalCaseDepthMm) },
      { key: 'surface', label: t('app.depth.surfaceCarbon'), value: show.carbon(simulation.surfaceCarbonPct) },
      { key: 'duration', label: t('app.cycle.cycleTime'), value: show.time(totalH), detail: show.hoursMinutes(totalH) },
    ],
    cautions: simulation.warnings.map((w) =>
      w.stepIndex === undefined ? warningMessage(t, w) : t('app.cycle.stepCaution', { n: w.stepIndex + 1, message: warningMessage(t, w) }),
    ),
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
