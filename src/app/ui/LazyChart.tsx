/**
 * Mounts a chart drawn by a lazily loaded module (uPlot and its CSS come with it) and redraws it on
 * new data or theme. With `readout`, a line under the chart gives the values where it was tapped
 * (for a screen reader too, politely); the table beside a chart carries the same numbers.
 */
import { useEffect, useRef, useState } from 'preact/hooks';

export interface ChartHandle<D> {
  /** New data, and the theme it is drawn in. */
  update(data: D, look?: string): void;
  resize(): void;
  destroy(): void;
}

/** Draws `data` into `el`; `onPoint` hears the index of the point tapped (null: none). */
export type ChartMounter<D> = (
  el: HTMLElement,
  data: D,
  onPoint: (index: number | null) => void,
  look: string,
) => ChartHandle<D>;

export function LazyChart<D>({
  data,
  label,
  theme,
  load,
  readout,
  className = 'profile-chart',
}: {
  data: D;
  label: string;
  theme: string;
  /** The chart module's mount function, loaded with `import()` on first use. */
  load: () => Promise<ChartMounter<D>>;
  /** The values at a tapped point in words, and what the line says before any tap. */
  readout?: { at: (index: number) => string; hint: string };
  className?: string;
}) {
  const box = useRef<HTMLDivElement>(null);
  const chart = useRef<ChartHandle<D> | null>(null);
  const [point, setPoint] = useState<number | null>(null);
  useEffect(() => {
    let cancelled = false;
    void load().then((mount) => {
      if (cancelled || !box.current) return;
      if (chart.current) chart.current.update(data, theme);
      else chart.current = mount(box.current, data, setPoint, theme);
    });
    return () => {
      cancelled = true;
    };
  }, [data, theme, load]);
  useEffect(() => {
    const onResize = () => chart.current?.resize();
    window.addEventListener('resize', onResize);
    return () => {
      window.removeEventListener('resize', onResize);
      chart.current?.destroy();
      chart.current = null;
    };
  }, []);
  const plot = <div class={className} ref={box} role="img" aria-label={label} />;
  if (!readout) return plot;
  return (
    <figure class="chart">
      {plot}
      <figcaption class="chart-readout" aria-live="polite">
        {(point === null ? '' : readout.at(point)) || readout.hint}
      </figcaption>
    </figure>
  );
}
