/** The label of an effective case depth: the stand-in threshold carbon and the hardness limit it stands for. */
import type { TFunction } from 'i18next';
import { CASE_CRITERIA, type Hardness } from '../../physics';
import type { Show } from '../ui/show';

export function ecdLabel(t: TFunction, show: Show, thresholdPct: number, limit: Hardness | undefined): string {
  return t('app.depth.ecd', {
    threshold: show.carbon(thresholdPct),
    criterion: show.hardness(limit ?? CASE_CRITERIA['iso-18203']),
  });
}
