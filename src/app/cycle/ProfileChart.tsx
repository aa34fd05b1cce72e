/**
 * Mounts a lazily loaded uPlot chart, with a line under it that gives the values where the plot is
 * tapped (for a screen reader too, politely); the table beside it carries the same numbers.
 */
import { useEffect, useRef, useState } from 'preact/hooks';
import type { ChartData, ChartKind, HistoryChartData, MountedChart, ProfileChartData } from './chart';

function Chart<K extends ChartKind>({
  kind,
  data,
  label,
  hint,
  theme,
}: {
  kind: K;
  data: ChartData<K>;
  label: string;
  hint: string;
  theme: string;
}) {
  const box = useRef<HTMLDivElement>(null);
  const chart = useRef<MountedChart<K> | null>(null);
  const [point, setPoint] = useState<number | null>(null);
  const readout = point === null ? '' : data.readout(point);
  useEffect(() => {
    let cancelled = false;
    void import('./chart').then(({ mountChart }) => {
      if (cancelled || !box.current) return;
      if (chart.current) chart.current.update(data, theme);
      else chart.current = mountChart(kind, box.current, data, setPoint, theme);
    });
    return () => {
      cancelled = true;
    };
  }, [kind, data, theme]);
  useEffect(() => {
    const onResize = () => chart.current?.resize();
    window.addEventListener('resize', onResize);
    return () => {
      window.removeEventListener('resize', onResize);
      chart.current?.destroy();
      chart.current = null;
    };
  }, []);
  return (
    <figure class="chart">
      <div class={`profile-chart chart-${kind}`} ref={box} role="img" aria-label={label} />
      <figcaption class="chart-readout" aria-live="polite">
        {readout || hint}
      </figcaption>
    </figure>
  );
}

export function ProfileChart(props: { data: ProfileChartData; label: string; hint: string; theme: string }) {
  return <Chart kind="profile" {...props} />;
}

export function HistoryChart(props: { data: HistoryChartData; label: string; hint: string; theme: string }) {
  return <Chart kind="history" {...props} />;
}
