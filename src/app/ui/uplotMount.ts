/** A uPlot chart as a ChartHandle: drawn to the box's width, redrawn whole on new data (only lazily loaded chart modules import this). */
import uPlot from 'uplot';
import type { ChartHandle } from './LazyChart';

/** A colour of the theme (CSS custom property), grey if it is not set. */
export const cssVar = (name: string) =>
  getComputedStyle(document.documentElement).getPropertyValue(name).trim() || '#888';

/** An axis in the theme's text and line colours, labelled in the app's type. */
export function themedAxis(label: string, scale: string, side?: 0 | 1 | 2 | 3): uPlot.Axis {
  const grid = cssVar('--line');
  return {
    scale,
    label,
    stroke: cssVar('--text'),
    grid: { stroke: grid, width: 1 },
    ticks: { stroke: grid },
    font: '13px system-ui, sans-serif',
    labelFont: '600 13px system-ui, sans-serif',
    // eslint-disable-next-line @typescript-eslint/no-unsafe-enum-assignment -- uPlot's Side is an ambient const enum, which isolated modules cannot name; its values are 0–3.
    ...(side === undefined ? {} : { side }),
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

/**
 * Draws a uPlot chart into `el`. `options` reads the data drawn now through `shown()` (marks drawn
 * on every frame read it there), so new figures with the same words and theme go into the same
 * chart (setData); new words or another theme (`look`) make a new one.
 */
export function mountUplot<D extends { labels: unknown }>(
  el: HTMLElement,
  data: D,
  look: string,
  options: (shown: () => D, width: number) => uPlot.Options,
  series: (data: D) => uPlot.AlignedData,
): ChartHandle<D> {
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
