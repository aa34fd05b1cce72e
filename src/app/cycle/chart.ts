/**
 * The cycle's charts, drawn with uPlot: the carbon and hardness profile against depth, and the
 * surface carbon over time. This module is loaded lazily (with uPlot and its CSS) the first time a
 * chart is shown. Ticks are written in the page's notation, placed close enough to read a value off
 * the axis; a tap (or a pointer) on the plot reports the values there through `onPoint`.
 */
import type uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import type { ChartHandle } from '../ui/LazyChart';
import { chartFrame, cssVar, depthMarker, mountUplot, themedAxis, type TickWriter } from '../ui/uplotMount';

/** What every cycle chart is given besides its series. */
interface ChartWords {
  tick: TickWriter;
  /** The values at point `index`, in words, for the line under the chart. */
  readout: (index: number) => string;
}

export interface ProfileChartData extends ChartWords {
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

export interface HistoryChartData extends ChartWords {
  time: number[];
  carbonPct: number[];
  labels: { time: string; carbon: string; carbonAxis: string };
}

/** `shown()` is the data drawn now: ticks and the ECD mark read it on every draw, so new figures need no new chart. */
function profileOptions(
  shown: () => ProfileChartData,
  width: number,
  onPoint: (index: number | null) => void,
): uPlot.Options {
  const data = shown();
  const carbon = cssVar('--chart-carbon');
  const hardness = cssVar('--chart-hardness');
  const mark = cssVar('--chart-mark');
  const tick = () => shown().tick;
  const base = chartFrame(width, onPoint);
  return {
    ...base,
    scales: { x: { time: false }, c: { auto: true }, hrc: { auto: false, range: [15, 70] } },
    axes: [
      themedAxis(data.labels.depth, 'x', tick),
      { ...themedAxis(data.labels.carbonAxis, 'c', tick), size: 50 },
      { ...themedAxis(data.labels.hardnessAxis, 'hrc', tick, 1), size: 44, grid: { show: false } },
    ],
    series: [
      {},
      { label: data.labels.carbon, scale: 'c', stroke: carbon, width: 3 },
      { label: data.labels.hardness, scale: 'hrc', stroke: hardness, width: 2, dash: [8, 5] },
      { label: data.labels.threshold, scale: 'c', stroke: mark, width: 1.5, dash: [3, 4], points: { show: false } },
      { label: data.labels.limit, scale: 'hrc', stroke: hardness, width: 1.5, dash: [2, 3], points: { show: false } },
    ],
    hooks: {
      ...base.hooks,
      draw: [
        (u) => {
          const { ecd, labels } = shown();
          depthMarker(u, ecd, labels.ecd, mark);
        },
      ],
    },
  };
}

const profileSeries = (data: ProfileChartData): uPlot.AlignedData => [
  data.depth,
  data.carbonPct,
  data.hardnessHrc,
  data.depth.map(() => data.thresholdPct),
  data.depth.map(() => data.limitHrc),
];

function historyOptions(
  shown: () => HistoryChartData,
  width: number,
  onPoint: (index: number | null) => void,
): uPlot.Options {
  const data = shown();
  const tick = () => shown().tick;
  return {
    ...chartFrame(width, onPoint),
    scales: { x: { time: false }, c: { auto: true } },
    axes: [themedAxis(data.labels.time, 'x', tick), { ...themedAxis(data.labels.carbonAxis, 'c', tick), size: 50 }],
    series: [{}, { label: data.labels.carbon, scale: 'c', stroke: cssVar('--chart-carbon'), width: 3 }],
  };
}

const historySeries = (data: HistoryChartData): uPlot.AlignedData => [data.time, data.carbonPct];

/** Draws the profile chart into `el`; the handle redraws it with new data, resizes or removes it. */
export const mountProfileChart = (
  el: HTMLElement,
  data: ProfileChartData,
  onPoint: (index: number | null) => void,
  look = '',
): ChartHandle<ProfileChartData> => mountUplot(el, data, onPoint, look, profileOptions, profileSeries);

/** Draws the surface-carbon chart into `el`. */
export const mountHistoryChart = (
  el: HTMLElement,
  data: HistoryChartData,
  onPoint: (index: number | null) => void,
  look = '',
): ChartHandle<HistoryChartData> => mountUplot(el, data, onPoint, look, historyOptions, historySeries);
