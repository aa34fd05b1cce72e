/** The likely range of an effective case depth as a result row: the band, and its parts in the detail. */
import type { TFunction } from 'i18next';
import type { DepthBand } from '../../physics';
import type { ResultRow } from '../ui/ResultList';
import type { Show } from '../ui/show';

export function bandRow(band: DepthBand, t: TFunction, show: Show): ResultRow {
  const parts = [
    t('app.band.models', { range: show.depthRange(band.models.min, band.models.max) }),
    t('app.band.temperature', {
      tolerance: show.temperatureDifference(band.temperatureToleranceC),
      range: show.depthRange(band.temperature.min, band.temperature.max),
    }),
    ...(band.beta ? [t('app.band.beta', { range: show.depthRange(band.beta.min, band.beta.max) })] : []),
  ];
  return {
    key: 'band',
    label: t('app.band.label'),
    value: show.depthRange(band.minMm, band.maxMm),
    detail: parts.join(' · '),
  };
}
