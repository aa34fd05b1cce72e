/** A furnace's depth correction from lab results in words, for every result it touches and for the furnace choice. */
import type { TFunction } from 'i18next';
import type { CalibrationState } from '../settings/calibration';
import type { Show } from '../ui/show';

export interface CalibrationWords {
  /** The whole sentence ("Depth correction for F1 from lab results: diffusion speed × 1.08 (1.00 = published model; …)"). */
  sentence: string;
  /** The short form beside a main answer (only when the factor is applied). */
  short?: string;
  /** The row's label when it is not the depth correction's (a learnt threshold). */
  label?: string;
}

/** The placeholders of a diffusion-speed factor: the factor and the 1.00 of the published model, both in the user's locale. */
export const speedParams = (show: Show, factor: number) => ({
  factor: show.number(factor, 2),
  neutral: show.number(1, 2),
});

export function calibrationWords(state: CalibrationState, t: TFunction, show: Show): CalibrationWords | undefined {
  if (state.kind === 'none') return undefined;
  const { furnace } = state;
  if (state.kind === 'uncalibrated') return { sentence: t('app.calibration.notFitted', { furnace }) };
  // A learnt threshold is used only by the cycle and planner screens, which word it (fields/learntWords.ts).
  if (state.kind === 'learnt') return undefined;
  const c = state.calibration;
  if (state.kind === 'off') return { sentence: t('app.calibration.off', { furnace }) };
  if (state.kind === 'otherModel')
    return { sentence: t('app.calibration.otherModel', { furnace, model: t(`app.models.${c.model}`) }) };
  const speed = speedParams(show, c.factor);
  return {
    sentence: t('app.calibration.applied', {
      furnace,
      ...speed,
      low: show.number(c.low, 2),
      high: show.number(c.high, 2),
      count: c.jobCount,
    }),
    short: t('app.calibration.short', { furnace, ...speed }),
  };
}
