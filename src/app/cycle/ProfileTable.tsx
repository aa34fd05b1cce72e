/** The profile as a plain table: the same numbers as the chart, for screen readers and print. */
import type { ProfilePoint } from '../../physics';
import type { ScreenContext } from '../settings/screenContext';

/** Every n-th point, so the table stays short on a phone. */
export function tableRows<P>(points: readonly P[], maxRows = 11): P[] {
  if (points.length <= maxRows) return [...points];
  const step = (points.length - 1) / (maxRows - 1);
  return Array.from({ length: maxRows }, (_, i) => points[Math.round(i * step)]!);
}

export function ProfileTable({ profile, ctx }: { profile: readonly ProfilePoint[]; ctx: ScreenContext }) {
  const { t, show } = ctx;
  const rows = tableRows(profile).map((p) => ({
    depth: show.depth(p.depthMm),
    carbon: show.carbon(p.carbonPct),
    hardness: show.hardnessHrc(p.hardnessHrc),
  }));
  return (
    <div class="table-wrap">
      <table class="numbers">
        <caption>{t('app.cycle.tableCaption')}</caption>
        <thead>
          <tr>
            <th scope="col">{t('app.cycle.depthColumn')}</th>
            <th scope="col">{t('app.cycle.carbonColumn')}</th>
            <th scope="col">{t('app.cycle.hardnessColumn')}</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={i}>
              <td>{r.depth}</td>
              <td>{r.carbon}</td>
              <td>{r.hardness}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
