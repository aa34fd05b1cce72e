/**
 * The carbon and hardness profile chart, drawn with uPlot. This module is loaded
 * lazily (with uPlot and its CSS) the first time a chart is shown.
 */
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import type { ChartHandle } from '../ui/LazyChart';
import { cssVar, depthMarker, mountUplot, themedAxis } from '../ui/uplotMount';

export interface ProfileChartData {
  depth: number[];
  carbonPct: number[];
  hardnessHrc: number[];
  thresholdPct: number;
  /** The case criterion in HRC, drawn across the hardness scale: the hardness curve meets it at the ECD. */
  limitHrc: number;
  ecd: number;
  /** Legend names in full; axes carry only the unit symbols so they fit a phone. */
  labels: {
    depth: string;
    carbon: string;
    hardness: string;
    threshold: string;
    limit: string;
    ecd: string;
    carbonAxis: string;
    hardnessAxis: string;
  };
}

/** `shown()` is the data drawn now: the ECD mark reads it on every draw, so new data needs no new chart. */
function options(shown: () => ProfileChartData, width: number): uPlot.Options {
  const data = shown();
  const carbon = cssVar('--chart-carbon');
  const hardness = cssVar('--chart-hardness');
  const mark = cssVar('--chart-mark');
  const axis = themedAxis;
  return {
    width,
    height: Math.round(Math.min(340, Math.max(240, width * 0.8))),
    legend: { show: true, live: false },
    cursor: { drag: { x: false, y: false } },
    scales: { x: { time: false }, c: { auto: true }, hrc: { auto: false, range: [15, 70] } },
    axes: [
      axis(data.labels.depth, 'x'),
      { ...axis(data.labels.carbonAxis, 'c'), size: 46 },
      { ...axis(data.labels.hardnessAxis, 'hrc', 1), size: 44, grid: { show: false } },
    ],
    series: [
      {},
      { label: data.labels.carbon, scale: 'c', stroke: carbon, width: 3 },
      { label: data.labels.hardness, scale: 'hrc', stroke: hardness, width: 2, dash: [8, 5] },
      { label: data.labels.threshold, scale: 'c', stroke: mark, width: 1.5, dash: [3, 4], points: { show: false } },
      { label: data.labels.limit, scale: 'hrc', stroke: hardness, width: 1.5, dash: [2, 3], points: { show: false } },
    ],
    hooks: {
      draw: [
        (u) => {
          const { ecd, labels } = shown();
          depthMarker(u, ecd, labels.ecd, mark);
        },
      ],
    },
  };
}

function series(data: ProfileChartData): uPlot.AlignedData {
  return [
    data.depth,
    data.carbonPct,
    data.hardnessHrc,
    data.depth.map(() => data.thresholdPct),
    data.depth.map(() => data.limitHrc),
  ];
}

/** Draws the chart into `el`; the handle redraws it with new data, resizes or removes it. */
export const mountProfileChart = (el: HTMLElement, data: ProfileChartData, look = ''): ChartHandle<ProfileChartData> =>
  mountUplot(el, data, look, options, series);
