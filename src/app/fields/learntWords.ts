/**
 * A learnt ECD threshold in words, on every result it changes: the threshold and the diffusion speed
 * fitted with it, from how many traverses of which grade in which furnace. Kept off the first screen
 * (the depth calculator does not apply learnt thresholds); other states are worded by calibrationWords.
 */
import type { TFunction } from 'i18next';
import { findGradeByIdOrName } from '../../physics';
import type { CalibrationState } from '../settings/calibration';
import type { Show } from '../ui/show';
import { calibrationWords, speedParams, type CalibrationWords } from './calibrationWords';

/** A grade as the trade writes it (the list's name for a listed id). */
export const gradeName = (grade: string): string => findGradeByIdOrName(grade)?.name ?? grade;

export function resultCalibrationWords(
  state: CalibrationState,
  t: TFunction,
  show: Show,
): CalibrationWords | undefined {
  if (state.kind !== 'learnt') return calibrationWords(state, t, show);
  const { furnace, learnt } = state;
  const grade = gradeName(learnt.grade);
  return {
    label: t('app.plantThreshold.label'),
    sentence: t('app.plantThreshold.applied', {
      threshold: show.carbon(learnt.thresholdPct),
      low: show.carbon(learnt.low),
      high: show.carbon(learnt.high),
      ...speedParams(show, learnt.factor),
      count: learnt.loadCount,
      grade,
      furnace,
    }),
    short: t('app.plantThreshold.short', { threshold: show.carbon(learnt.thresholdPct), grade, furnace }),
  };
}
