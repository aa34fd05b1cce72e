/**
 * The charts of a simulated cycle with their tables (the same numbers, for screen readers and print):
 * carbon and indicative hardness by depth, and the surface carbon over the cycle. The cycle editor and
 * the planner show the same.
 */
import type { SimulationResult } from '../../physics';
import { theme } from '../settings/state';
import type { ScreenContext } from '../settings/screenContext';
import type { HistoryChartData, ProfileChartData } from './chart';
import { HistoryChart, ProfileChart } from './ProfileChart';
import { ProfileTable, tableRows } from './ProfileTable';

export function CycleCharts({
  simulation,
  profile,
  history,
  hardnessMethod,
  ctx,
}: {
  simulation: SimulationResult;
  profile: ProfileChartData;
  history: HistoryChartData;
  hardnessMethod: string;
  ctx: ScreenContext;
}) {
  const { t, show } = ctx;
  return (
    <>
      <ProfileChart
        data={profile}
        label={t('app.cycle.chartLabel')}
        hint={t('app.cycle.chartHint')}
        theme={theme.value}
      />
      <p class="note">{hardnessMethod}</p>
      <ProfileTable profile={simulation.profile} ctx={ctx} />
      <h3 class="card-subheading">{t('app.cycle.historyHeading')}</h3>
      <HistoryChart
        data={history}
        label={t('app.cycle.historyLabel')}
        hint={t('app.cycle.chartHint')}
        theme={theme.value}
      />
      <div class="table-wrap">
        <table class="numbers">
          <caption>{t('app.cycle.historyCaption')}</caption>
          <thead>
            <tr>
              <th scope="col">{t('app.cycle.historyTimeColumn')}</th>
              <th scope="col">{t('app.cycle.carbonColumn')}</th>
            </tr>
          </thead>
          <tbody>
            {tableRows(simulation.surfaceHistory).map((p, i) => (
              <tr key={i}>
                <td>{show.hoursMinutes(p.timeH)}</td>
                <td>{show.carbon(p.carbonPct)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </>
  );
}
