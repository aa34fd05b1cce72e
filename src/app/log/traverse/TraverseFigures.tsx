/**
 * What a traverse says, beside the job's prediction: its ECD at the limit, surface and core
 * hardness (optional, the job page shows them with the other lab figures), its cautions, and the
 * chart of the points over the predicted indicative hardness, with the method in words.
 */
import { useMemo } from 'preact/hooks';
import { predictedProfile, type Job } from '../../../jobs';
import type { TraversePoint, TraverseResult } from '../../../physics';
import { hardnessMethodText } from '../../cycle/view';
import { theme } from '../../settings/state';
import { useScreenContext } from '../../settings/screenContext';
import { LazyChart } from '../../ui/LazyChart';
import { Cautions } from '../../ui/Notices';
import { ResultList } from '../../ui/ResultList';
import { traverseCautions, traverseChartData, traverseRows } from './traverseView';

const loadChart = () => import('./traverseChart').then((m) => m.mountTraverseChart);

export function TraverseFigures({
  job,
  points,
  analysis,
  withRows,
}: {
  job: Job;
  points: readonly TraversePoint[];
  analysis: TraverseResult;
  withRows: boolean;
}) {
  const ctx = useScreenContext();
  const { t, show } = ctx;
  const predicted = useMemo(
    () => predictedProfile(job, { limit: analysis.limit, coreHardness: analysis.coreHardness }),
    [job, analysis],
  );
  const profile = typeof predicted === 'string' ? undefined : predicted;
  const chart = useMemo(() => traverseChartData(points, analysis, profile, ctx), [points, analysis, profile, ctx]);
  const grade = job.steel.gradeId ?? job.steel.gradeName;
  return (
    <div class="traverse-figures">
      {withRows && <ResultList rows={traverseRows(analysis, ctx)} label={t('app.log.traverse.heading')} />}
      <Cautions title={t('app.log.traverse.cautions')} messages={traverseCautions(analysis, ctx)} />
      <LazyChart data={chart} label={t('app.log.traverse.chart.label')} theme={theme.value} load={loadChart} />
      <p class="note">
        {profile
          ? hardnessMethodText(profile.hardnessBasis, grade, t, show, 'lab')
          : t('app.log.traverse.noPrediction', { reason: t(`app.calibration.leftOutReason.${predicted as string}`) })}
      </p>
      <p class="note">{t('app.log.traverse.readCoreDeep')}</p>
    </div>
  );
}
