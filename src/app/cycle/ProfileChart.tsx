/** Mounts the lazily loaded uPlot chart; the table below it carries the same numbers. */
import { useEffect, useRef } from 'preact/hooks';
import type { ProfileChartData } from './chart';

type Chart = ReturnType<(typeof import('./chart'))['mountProfileChart']>;

export function ProfileChart({ data, label, theme }: { data: ProfileChartData; label: string; theme: string }) {
  const box = useRef<HTMLDivElement>(null);
  const chart = useRef<Chart | null>(null);
  useEffect(() => {
    let cancelled = false;
    void import('./chart').then(({ mountProfileChart }) => {
      if (cancelled || !box.current) return;
      if (chart.current) chart.current.update(data, theme);
      else chart.current = mountProfileChart(box.current, data, theme);
    });
    return () => {
      cancelled = true;
    };
  }, [data, theme]);
  useEffect(() => {
    const onResize = () => chart.current?.resize();
    window.addEventListener('resize', onResize);
    return () => {
      window.removeEventListener('resize', onResize);
      chart.current?.destroy();
      chart.current = null;
    };
  }, []);
  return <div class="profile-chart" ref={box} role="img" aria-label={label} />;
}
