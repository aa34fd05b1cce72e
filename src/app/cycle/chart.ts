/**
 * The carbon and hardness profile chart, drawn with uPlot. This module is loaded
 * lazily (with uPlot and its CSS) the first time a chart is shown.
 */
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';

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

const cssVar = (name: string) => getComputedStyle(document.documentElement).getPropertyValue(name).trim() || '#888';

/** `shown()` is the data drawn now: the ECD mark reads it on every draw, so new data needs no new chart. */
function options(shown: () => ProfileChartData, width: number): uPlot.Options {
  const data = shown();
  const text = cssVar('--text');
  const grid = cssVar('--line');
  const carbon = cssVar('--chart-carbon');
  const hardness = cssVar('--chart-hardness');
  const mark = cssVar('--chart-mark');
  const axis = (label: string, scale: string, side?: 0 | 1 | 2 | 3): uPlot.Axis => ({
    scale,
    label,
    stroke: text,
    grid: { stroke: grid, width: 1 },
    ticks: { stroke: grid },
    font: '13px system-ui, sans-serif',
    labelFont: '600 13px system-ui, sans-serif',
    // eslint-disable-next-line @typescript-eslint/no-unsafe-enum-assignment -- uPlot's Side is an ambient const enum, which isolated modules cannot name; its values are 0–3.
    ...(side === undefined ? {} : { side }),
  });
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

function series(data: ProfileChartData): uPlot.AlignedData {
  return [
    data.depth,
    data.carbonPct,
    data.hardnessHrc,
    data.depth.map(() => data.thresholdPct),
    data.depth.map(() => data.limitHrc),
  ];
}

/** Draws the chart into `el`; returns a function that redraws with new data or removes it. */
export function mountProfileChart(el: HTMLElement, data: ProfileChartData, look = '') {
  let current = data;
  let drawnLook = look;
  const make = () =>
    new uPlot(
      options(() => current, el.clientWidth || 320),
      series(current),
      el,
    );
  let plot = make();
  return {
    /** New figures are drawn into the same chart; new words or another theme (`look`) make a new one. */
    update(next: ProfileChartData, nextLook = drawnLook) {
      const sameWords = JSON.stringify(next.labels) === JSON.stringify(current.labels);
      current = next;
      if (sameWords && nextLook === drawnLook) {
        plot.setData(series(current));
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
