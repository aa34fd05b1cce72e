/** A furnace's calibration in words, for every result it touches and for the furnace choice. */
import type { TFunction } from 'i18next';
import type { CalibrationState } from '../settings/calibration';
import type { Show } from '../ui/show';

export interface CalibrationWords {
  /** The whole sentence ("Calibrated for F1: D × 1.08 (95 %: 1.02–1.15, 7 jobs)"). */
  sentence: string;
  /** The short form beside a main answer (only when the factor is applied). */
  short?: string;
}

export function calibrationWords(state: CalibrationState, t: TFunction, show: Show): CalibrationWords | undefined {
  if (state.kind === 'none') return undefined;
  const { furnace } = state;
  if (state.kind === 'uncalibrated') return { sentence: t('app.calibration.notFitted', { furnace }) };
  const c = state.calibration;
  if (state.kind === 'off') return { sentence: t('app.calibration.off', { furnace }) };
  if (state.kind === 'otherModel')
    return { sentence: t('app.calibration.otherModel', { furnace, model: t(`app.models.${c.model}`) }) };
  const factor = show.number(c.factor, 2);
  return {
    sentence: t('app.calibration.applied', {
      furnace,
      factor,
      low: show.number(c.low, 2),
      high: show.number(c.high, 2),
      count: c.jobCount,
    }),
    short: t('app.calibration.short', { furnace, factor }),
  };
}
