/**
 * What the cycle's two charts draw, worded and in the user's units: the carbon and hardness profile
 * against depth, and the surface carbon over the cycle's time. Shared by the cycle editor and the
 * planner; each chart has a table of the same numbers beside it.
 */
import type { TFunction } from 'i18next';
import { convert, type Recipe, type SimulationResult } from '../../physics';
import { UNIT_SYMBOLS } from '../ui/format';
import type { Show } from '../ui/show';
import type { DisplayUnits } from '../ui/units';
import type { HistoryChartData, ProfileChartData } from './chart';

const toUnit = (value: number, from: string, unit: string) => {
  const r = convert(value, from, unit);
  return r.ok ? r.value : Number.NaN;
};

/** Decimals of an axis tick: as many as the step between ticks has (0.25 → 2, 0.5 → 1, 20 → 0), at most 4. */
export function tickDigits(step: number): number {
  if (!(step > 0)) return 0;
  const written = Number(step.toPrecision(6)).toFixed(6).replace(/0+$/u, '');
  return Math.min(4, written.split('.')[1]?.length ?? 0);
}

export function profileChartData(
  simulation: SimulationResult,
  recipe: Recipe,
  t: TFunction,
  show: Show,
  units: DisplayUnits,
): ProfileChartData {
  const threshold = recipe.thresholdCarbonPct ?? 0;
  const basis = simulation.hardnessBasis;
  const { profile } = simulation;
  return {
    depth: profile.map((p) => toUnit(p.depthMm, 'mm', units.depth)),
    carbonPct: profile.map((p) => p.carbonPct),
    hardnessHrc: profile.map((p) => p.hardnessHrc),
    thresholdPct: threshold,
    limitHrc: basis.limitHrc,
    ecd: toUnit(simulation.effectiveCaseDepthMm, 'mm', units.depth),
    tick: (value, step) => show.number(value, tickDigits(step)),
    readout: (i) => {
      const p = profile[i];
      return p
        ? t('app.cycle.chartReadout', {
            depth: show.depth(p.depthMm),
            carbon: show.carbon(p.carbonPct),
            hardness: show.hardnessHrc(p.hardnessHrc),
          })
        : '';
    },
    labels: {
      depth: t('app.cycle.chartDepth', { unit: UNIT_SYMBOLS[units.depth] ?? units.depth }),
      carbon: t('app.cycle.chartCarbon'),
      hardness: t('app.cycle.chartHardness'),
      threshold: t('app.cycle.chartThreshold', { threshold: show.carbon(threshold) }),
      limit: t('app.cycle.chartLimit', { limit: show.hardness(basis.limit) }),
      ecd: t('app.cycle.chartEcd'),
      carbonAxis: UNIT_SYMBOLS.pctC!,
      hardnessAxis: UNIT_SYMBOLS.HRC!,
    },
  };
}

export function historyChartData(
  simulation: SimulationResult,
  t: TFunction,
  show: Show,
  units: DisplayUnits,
): HistoryChartData {
  const history = simulation.surfaceHistory;
  return {
    time: history.map((p) => toUnit(p.timeH, 'h', units.time)),
    carbonPct: history.map((p) => p.carbonPct),
    tick: (value, step) => show.number(value, tickDigits(step)),
    readout: (i) => {
      const p = history[i];
      return p
        ? t('app.cycle.historyReadout', { time: show.hoursMinutes(p.timeH), carbon: show.carbon(p.carbonPct) })
        : '';
    },
    labels: {
      time: t('app.cycle.historyTime', { unit: UNIT_SYMBOLS[units.time] ?? units.time }),
      carbon: t('app.cycle.historyCarbon'),
      carbonAxis: UNIT_SYMBOLS.pctC!,
    },
  };
}
