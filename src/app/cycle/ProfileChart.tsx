/** The cycle's carbon and hardness profile chart; the table below it carries the same numbers. */
import { LazyChart } from '../ui/LazyChart';
import type { ProfileChartData } from './chart';

const load = () => import('./chart').then((m) => m.mountProfileChart);

export function ProfileChart({ data, label, theme }: { data: ProfileChartData; label: string; theme: string }) {
  return <LazyChart data={data} label={label} theme={theme} load={load} />;
}
