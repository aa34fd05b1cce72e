/** The cycle's two charts: carbon and hardness by depth, and the surface carbon over time; a tap gives the values under the chart. */
import { LazyChart } from '../ui/LazyChart';
import type { HistoryChartData, ProfileChartData } from './chart';

const loadProfile = () => import('./chart').then((m) => m.mountProfileChart);
const loadHistory = () => import('./chart').then((m) => m.mountHistoryChart);

interface ChartProps<D> {
  data: D;
  label: string;
  /** What the line under the chart says before a tap. */
  hint: string;
  theme: string;
}

export function ProfileChart({ data, label, hint, theme }: ChartProps<ProfileChartData>) {
  return (
    <LazyChart
      data={data}
      label={label}
      theme={theme}
      load={loadProfile}
      readout={{ at: data.readout, hint }}
      className="profile-chart chart-profile"
    />
  );
}

export function HistoryChart({ data, label, hint, theme }: ChartProps<HistoryChartData>) {
  return (
    <LazyChart
      data={data}
      label={label}
      theme={theme}
      load={loadHistory}
      readout={{ at: data.readout, hint }}
      className="profile-chart chart-history"
    />
  );
}
