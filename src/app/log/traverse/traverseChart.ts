/**
 * The lab's traverse drawn over the job's predicted hardness profile, with uPlot. Loaded lazily
 * (with uPlot and its CSS) the first time a traverse is shown.
 */
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import type { ChartHandle } from '../../ui/LazyChart';
import { chartFrame, cssVar, depthMarker, mountUplot, themedAxis } from '../../ui/uplotMount';

export interface TraverseChartData {
  /** The lab's points: depth in the user's unit, hardness in the traverse's unit. */
  measured: { depth: number[]; hardness: number[] };
  /** The predicted indicative hardness in the same units (null where it has no value in that scale). */
  predicted?: { depth: number[]; hardness: (number | null)[] };
  limit: number;
  measuredEcd?: number;
  predictedEcd?: number;
  labels: {
    depth: string;
    hardnessAxis: string;
    measured: string;
    predicted: string;
    limit: string;
    measuredEcd: string;
    predictedEcd: string;
  };
}

/** One x axis for both: the union of the measured and predicted depths, each series null where it has no point. */
export function alignTraverse(data: TraverseChartData): uPlot.AlignedData {
  const xs = [...new Set([...data.measured.depth, ...(data.predicted?.depth ?? [])])].sort((a, b) => a - b);
  const at = (depth: readonly number[], values: readonly (number | null)[]) => {
    const byDepth = new Map(depth.map((d, i) => [d, values[i] ?? null]));
    return xs.map((x) => byDepth.get(x) ?? null);
  };
  return [
    xs,
    at(data.measured.depth, data.measured.hardness),
    at(data.predicted?.depth ?? [], data.predicted?.hardness ?? []),
    xs.map(() => data.limit),
  ];
}

/** `shown()` is the data drawn now: the ECD marks read it on every draw. */
function options(
  shown: () => TraverseChartData,
  width: number,
  onPoint: (index: number | null) => void,
): uPlot.Options {
  const data = shown();
  const measured = cssVar('--chart-carbon');
  const predicted = cssVar('--chart-hardness');
  const mark = cssVar('--chart-mark');
  const base = chartFrame(width, onPoint);
  return {
    ...base,
    scales: { x: { time: false }, h: { auto: true } },
    axes: [themedAxis(data.labels.depth, 'x'), { ...themedAxis(data.labels.hardnessAxis, 'h'), size: 50 }],
    series: [
      {},
      {
        label: data.labels.measured,
        scale: 'h',
        stroke: measured,
        width: 0,
        paths: () => null,
        points: { show: true, size: 9, stroke: measured, fill: measured },
      },
      {
        label: data.labels.predicted,
        scale: 'h',
        stroke: predicted,
        width: 2,
        spanGaps: true,
        points: { show: false },
      },
      { label: data.labels.limit, scale: 'h', stroke: mark, width: 1.5, dash: [3, 4], points: { show: false } },
    ],
    hooks: {
      ...base.hooks,
      draw: [
        (u) => {
          const { measuredEcd, predictedEcd, labels } = shown();
          if (measuredEcd !== undefined) depthMarker(u, measuredEcd, labels.measuredEcd, mark);
          if (predictedEcd !== undefined) depthMarker(u, predictedEcd, labels.predictedEcd, mark, 1, [6, 4]);
        },
      ],
    },
  };
}

/** Draws the chart into `el`; the handle redraws it with new data, resizes or removes it. */
export const mountTraverseChart = (
  el: HTMLElement,
  data: TraverseChartData,
  onPoint: (index: number | null) => void,
  look = '',
): ChartHandle<TraverseChartData> => mountUplot(el, data, onPoint, look, options, alignTraverse);
