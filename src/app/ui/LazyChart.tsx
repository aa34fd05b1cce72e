/** Mounts a chart drawn by a lazily loaded module (uPlot and its CSS come with it); redraws on new data or theme. */
import { useEffect, useRef } from 'preact/hooks';

export interface ChartHandle<D> {
  /** New data, and the theme it is drawn in. */
  update(data: D, look?: string): void;
  resize(): void;
  destroy(): void;
}

export type ChartMounter<D> = (el: HTMLElement, data: D, look: string) => ChartHandle<D>;

export function LazyChart<D>({
  data,
  label,
  theme,
  load,
  className = 'profile-chart',
}: {
  data: D;
  label: string;
  theme: string;
  /** The chart module's mount function, loaded with `import()` on first use. */
  load: () => Promise<ChartMounter<D>>;
  className?: string;
}) {
  const box = useRef<HTMLDivElement>(null);
  const chart = useRef<ChartHandle<D> | null>(null);
  useEffect(() => {
    let cancelled = false;
    void load().then((mount) => {
      if (cancelled || !box.current) return;
      if (chart.current) chart.current.update(data, theme);
      else chart.current = mount(box.current, data, theme);
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
  return <div class={className} ref={box} role="img" aria-label={label} />;
}
