/** A traverse's figures as worded rows and as chart data, in the user's units (kept out of the JSX). */
import type { TFunction } from 'i18next';
import type { PredictedProfile } from '../../../jobs';
import {
  convert,
  CORE_RULE,
  hardnessIn,
  type Hardness,
  type HardnessUnit,
  type TraversePoint,
  type TraverseResult,
} from '../../../physics';
import { UNIT_SYMBOLS } from '../../ui/format';
import type { ResultRow } from '../../ui/ResultList';
import type { Show } from '../../ui/show';
import type { DisplayUnits } from '../../ui/units';
import { wordWarning } from '../../ui/warningText';
import type { TraverseChartData } from './traverseChart';

export interface TraverseWording {
  t: TFunction;
  show: Show;
  units: DisplayUnits;
}

/** Hardness shown as the lab reads it: whole HV, HRC to a tenth. */
export const hardnessDigits = (unit: HardnessUnit) => (unit === 'HRC' ? 1 : 0);
const hardnessText = (show: Show, h: Hardness) => show.hardness(h, hardnessDigits(h.unit));

/** ECD, surface and core hardness of an analysed traverse. */
export function traverseRows(analysis: TraverseResult, { t, show }: TraverseWording): ResultRow[] {
  const limit = hardnessText(show, analysis.limit);
  const rows: ResultRow[] = [
    {
      key: 'traverseEcd',
      label: t('app.log.traverse.result.ecd', { limit }),
      value:
        analysis.effectiveCaseDepthMm === null
          ? t('app.log.traverse.result.noEcd')
          : show.depth(analysis.effectiveCaseDepthMm),
      ...(analysis.bracket
        ? {
            detail: t('app.log.traverse.result.between', {
              from: show.depth(analysis.bracket[0].depthMm),
              to: show.depth(analysis.bracket[1].depthMm),
            }),
          }
        : {}),
      main: true,
      ...(analysis.effectiveCaseDepthMm === null ? { text: true } : {}),
    },
    {
      key: 'traverseSurface',
      label: t('app.log.traverse.result.surface'),
      value: hardnessText(show, analysis.surfaceHardness),
    },
  ];
  rows.push(
    analysis.coreHardness
      ? {
          key: 'traverseCore',
          label: t('app.log.traverse.result.core', { count: CORE_RULE.points }),
          value: hardnessText(show, analysis.coreHardness),
        }
      : {
          key: 'traverseCore',
          label: t('app.log.traverse.result.core', { count: CORE_RULE.points }),
          value: t('app.log.traverse.result.noCore'),
          text: true,
        },
  );
  return rows;
}

/** The traverse's cautions in words (units and locale of the user). */
export const traverseCautions = (analysis: TraverseResult, { t, show }: TraverseWording): string[] =>
  analysis.warnings.map((w) => wordWarning(t, w, show));

const inDepthUnit = (mm: number, unit: string) => {
  const converted = convert(mm, 'mm', unit);
  return converted.ok ? converted.value : mm;
};

/** The chart of the points over the predicted profile, in the user's depth unit and the traverse's hardness unit. */
export function traverseChartData(
  points: readonly TraversePoint[],
  analysis: TraverseResult,
  predicted: PredictedProfile | undefined,
  { t, show, units }: TraverseWording,
): TraverseChartData {
  const unit = points[0]?.unit ?? analysis.limit.unit;
  const depthUnit = units.depth;
  const inUnit = (h: Hardness) => hardnessIn(h, unit) ?? null;
  const measured = points.map((p) => ({ depth: inDepthUnit(p.depthMm, depthUnit), hardness: inUnit(p) }));
  const shown = measured.filter((m): m is { depth: number; hardness: number } => m.hardness !== null);
  const limit = inUnit(analysis.limit) ?? analysis.limit.value;
  return {
    measured: { depth: shown.map((m) => m.depth), hardness: shown.map((m) => m.hardness) },
    ...(predicted
      ? {
          predicted: {
            depth: predicted.profile.map((p) => inDepthUnit(p.depthMm, depthUnit)),
            hardness: predicted.profile.map((p) => inUnit({ value: p.hardnessHrc, unit: 'HRC' })),
          },
          predictedEcd: inDepthUnit(predicted.effectiveCaseDepthMm, depthUnit),
        }
      : {}),
    limit,
    ...(analysis.effectiveCaseDepthMm === null
      ? {}
      : { measuredEcd: inDepthUnit(analysis.effectiveCaseDepthMm, depthUnit) }),
    labels: {
      depth: t('app.log.traverse.chart.depth', { unit: UNIT_SYMBOLS[depthUnit] ?? depthUnit }),
      hardnessAxis: UNIT_SYMBOLS[unit] ?? unit,
      measured: t('app.log.traverse.chart.measured'),
      predicted: t('app.log.traverse.chart.predicted'),
      limit: t('app.log.traverse.chart.limit', { limit: hardnessText(show, analysis.limit) }),
      measuredEcd: t('app.log.traverse.chart.measuredEcd'),
      predictedEcd: t('app.log.traverse.chart.predictedEcd'),
    },
  };
}
