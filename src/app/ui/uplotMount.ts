/** What every uPlot chart of the app shares: theme colours, axes, frame, marks and redrawing (only lazily loaded chart modules import this). */
import uPlot from 'uplot';
import type { ChartHandle } from './LazyChart';

/** A colour of the theme (CSS custom property), grey if it is not set. */
export const cssVar = (name: string) =>
  getComputedStyle(document.documentElement).getPropertyValue(name).trim() || '#888';

/** A tick in the locale's notation; `step` is the distance between two ticks. */
export type TickWriter = (value: number, step: number) => string;

/** Pixels between ticks at least: a depth tick every 0.5 mm or closer on a phone, each still readable. */
const TICK_SPACE_X = 30;
const TICK_SPACE_Y = 28;

/**
 * An axis in the theme's text and line colours, labelled in the app's type. With `tick` (read on
 * every draw, so new words need no new chart) the ticks are written in the page's notation.
 */
export function themedAxis(label: string, scale: string, tick?: () => TickWriter, side?: 0 | 1 | 2 | 3): uPlot.Axis {
  const grid = cssVar('--line');
  return {
    scale,
    label,
    stroke: cssVar('--text'),
    grid: { stroke: grid, width: 1 },
    ticks: { stroke: grid },
    font: '13px system-ui, sans-serif',
    labelFont: '600 13px system-ui, sans-serif',
    space: scale === 'x' ? TICK_SPACE_X : TICK_SPACE_Y,
    ...(tick
      ? {
          values: (_u: uPlot, splits: number[]) => {
            const step = splits.length > 1 ? Math.abs(splits[1]! - splits[0]!) : 1;
            const write = tick();
            return splits.map((v) => write(v, step));
          },
        }
      : {}),
    // eslint-disable-next-line @typescript-eslint/no-unsafe-enum-assignment -- uPlot's Side is an ambient const enum, which isolated modules cannot name; its values are 0–3.
    ...(side === undefined ? {} : { side }),
  };
}

/** Size, legend without live values (the line under the chart has them) and a cursor that reports the point tapped. */
export function chartFrame(
  width: number,
  onPoint: (index: number | null) => void,
): Omit<uPlot.Options, 'series' | 'axes'> {
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

/**
 * A vertical line at `depth` with its label at the top (row 0, 1, … downward), the label set on the
 * left of the line where it would run past the plot's right edge.
 */
export function depthMarker(u: uPlot, depth: number, label: string, colour: string, row = 0, dash: number[] = []) {
  const x = u.valToPos(depth, 'x', true);
  if (!Number.isFinite(x)) return;
  const px = devicePixelRatio;
  const ctx = u.ctx;
  ctx.save();
  ctx.strokeStyle = colour;
  ctx.setLineDash(dash.map((d) => d * px));
  ctx.lineWidth = 2 * px;
  ctx.beginPath();
  ctx.moveTo(x, u.bbox.top);
  ctx.lineTo(x, u.bbox.top + u.bbox.height);
  ctx.stroke();
  ctx.fillStyle = colour;
  ctx.font = `600 ${12 * px}px system-ui, sans-serif`;
  const width = ctx.measureText(label).width;
  const left = x + 4 * px + width > u.bbox.left + u.bbox.width ? x - 4 * px - width : x + 4 * px;
  ctx.fillText(label, left, u.bbox.top + (14 + 16 * row) * px);
  ctx.restore();
}

export type ChartOptions<D> = (shown: () => D, width: number, onPoint: (index: number | null) => void) => uPlot.Options;

/**
 * Draws a uPlot chart into `el`. `options` reads the data drawn now through `shown()` (ticks and
 * marks drawn on every frame read it there), so new figures with the same words and theme go into
 * the same chart (setData); new words or another theme (`look`) make a new one.
 */
export function mountUplot<D extends { labels: unknown }>(
  el: HTMLElement,
  data: D,
  onPoint: (index: number | null) => void,
  look: string,
  options: ChartOptions<D>,
  series: (data: D) => uPlot.AlignedData,
): ChartHandle<D> {
  let current = data;
  let drawnLook = look;
  const make = () =>
    new uPlot(
      options(() => current, el.clientWidth || 320, onPoint),
      series(current),
      el,
    );
  let plot = make();
  return {
    update(next, nextLook = drawnLook) {
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
