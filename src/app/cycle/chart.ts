/**
 * The cycle's charts, drawn with uPlot: the carbon and hardness profile against depth, and the
 * surface carbon over time. This module is loaded lazily (with uPlot and its CSS) the first time a
 * chart is shown. Ticks are written in the page's notation, placed close enough to read a value off
 * the axis; a tap (or a pointer) on the plot reports the values there through `onPoint`.
 */
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';

/** What every chart is given besides its series. */
interface ChartWords {
  /** A tick in the locale's notation; `step` is the distance between two ticks. */
  tick: (value: number, step: number) => string;
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

const cssVar = (name: string) => getComputedStyle(document.documentElement).getPropertyValue(name).trim() || '#888';

/** Pixels between ticks at least: a depth tick every 0.5 mm or closer on a phone, each still readable. */
const TICK_SPACE_X = 30;
const TICK_SPACE_Y = 28;

function axis(label: string, scale: string, words: () => ChartWords, side?: 0 | 1 | 2 | 3): uPlot.Axis {
  const text = cssVar('--text');
  const grid = cssVar('--line');
  return {
    scale,
    label,
    stroke: text,
    grid: { stroke: grid, width: 1 },
    ticks: { stroke: grid },
    font: '13px system-ui, sans-serif',
    labelFont: '600 13px system-ui, sans-serif',
    space: scale === 'x' ? TICK_SPACE_X : TICK_SPACE_Y,
    values: (_u, splits) => {
      const step = splits.length > 1 ? Math.abs(splits[1]! - splits[0]!) : 1;
      const { tick } = words();
      return splits.map((v) => tick(v, step));
    },
    // eslint-disable-next-line @typescript-eslint/no-unsafe-enum-assignment -- uPlot's Side is an ambient const enum, which isolated modules cannot name; its values are 0–3.
    ...(side === undefined ? {} : { side }),
  };
}

/** The frame every chart shares: size, legend without live values (the line under the chart has them), cursor. */
function frame(width: number, onPoint: (index: number | null) => void): Omit<uPlot.Options, 'series' | 'axes'> {
  return {
    width,
    height: Math.round(Math.min(340, Math.max(240, width * 0.8))),
    legend: { show: true, live: false },
    cursor: { drag: { x: false, y: false }, points: { size: 10 } },
    hooks: {
      setCursor: [
        (u) => {
          onPoint(u.cursor.idx ?? null);
        },
      ],
    },
  };
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
  const base = frame(width, onPoint);
  return {
    ...base,
    scales: { x: { time: false }, c: { auto: true }, hrc: { auto: false, range: [15, 70] } },
    axes: [
      axis(data.labels.depth, 'x', shown),
      { ...axis(data.labels.carbonAxis, 'c', shown), size: 50 },
      { ...axis(data.labels.hardnessAxis, 'hrc', shown, 1), size: 44, grid: { show: false } },
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
          const x = u.valToPos(ecd, 'x', true);
          if (!Number.isFinite(x)) return;
          const ctx = u.ctx;
          ctx.save();
          ctx.strokeStyle = mark;
          ctx.setLineDash([]);
          ctx.lineWidth = 2 * devicePixelRatio;
          ctx.beginPath();
          ctx.moveTo(x, u.bbox.top);
          ctx.lineTo(x, u.bbox.top + u.bbox.height);
          ctx.stroke();
          ctx.fillStyle = mark;
          ctx.font = `600 ${12 * devicePixelRatio}px system-ui, sans-serif`;
          ctx.fillText(labels.ecd, x + 4 * devicePixelRatio, u.bbox.top + 14 * devicePixelRatio);
          ctx.restore();
        },
      ],
    },
  };
}

function profileSeries(data: ProfileChartData): uPlot.AlignedData {
  return [
    data.depth,
    data.carbonPct,
    data.hardnessHrc,
    data.depth.map(() => data.thresholdPct),
    data.depth.map(() => data.limitHrc),
  ];
}

function historyOptions(
  shown: () => HistoryChartData,
  width: number,
  onPoint: (index: number | null) => void,
): uPlot.Options {
  const data = shown();
  return {
    ...frame(width, onPoint),
    scales: { x: { time: false }, c: { auto: true } },
    axes: [axis(data.labels.time, 'x', shown), { ...axis(data.labels.carbonAxis, 'c', shown), size: 50 }],
    series: [{}, { label: data.labels.carbon, scale: 'c', stroke: cssVar('--chart-carbon'), width: 3 }],
  };
}

const historySeries = (data: HistoryChartData): uPlot.AlignedData => [data.time, data.carbonPct];

export type ChartKind = 'profile' | 'history';
export type ChartData<K extends ChartKind> = K extends 'profile' ? ProfileChartData : HistoryChartData;

export interface MountedChart<K extends ChartKind> {
  /** New figures are drawn into the same chart; new words or another theme (`look`) make a new one. */
  update(next: ChartData<K>, look?: string): void;
  resize(): void;
  destroy(): void;
}

/** Draws a chart into `el`; what it returns redraws it with new data, resizes or removes it. */
export function mountChart<K extends ChartKind>(
  kind: K,
  el: HTMLElement,
  data: ChartData<K>,
  onPoint: (index: number | null) => void,
  look = '',
): MountedChart<K> {
  let current = data;
  let drawnLook = look;
  const seriesOf = (next: ChartData<K>) =>
    kind === 'profile' ? profileSeries(next as ProfileChartData) : historySeries(next as HistoryChartData);
  const make = () => {
    const width = el.clientWidth || 320;
    const options =
      kind === 'profile'
        ? profileOptions(() => current as ProfileChartData, width, onPoint)
        : historyOptions(() => current as HistoryChartData, width, onPoint);
    return new uPlot(options, seriesOf(current), el);
  };
  let plot = make();
  return {
    update(next, nextLook = drawnLook) {
      const sameWords = JSON.stringify(next.labels) === JSON.stringify(current.labels);
      current = next;
      if (sameWords && nextLook === drawnLook) {
        plot.setData(seriesOf(current));
        return;
      }
      drawnLook = nextLook;
      plot.destroy();
      plot = make();
    },
    resize() {
      plot.setSize({ width: el.clientWidth || 320, height: plot.height });
    },
    destroy() {
      plot.destroy();
    },
  };
}
