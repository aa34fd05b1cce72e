/** Words a physics caution or planner finding for the screen, figures in the user's units (physics `WARNING_PARAM_UNITS`). */
import type { TFunction } from 'i18next';
import { warningMessage } from '../../i18n/i18n';
import type { Warning } from '../../physics';
import type { Show } from './show';

/** The sentence for a warning, every figure that has a unit in the user's units and locale. */
export function wordWarning(t: TFunction, warning: Warning, show: Show): string {
  return warningMessage(t, warning, show.figure);
}

/** A cycle's cautions, each prefixed with its step when it concerns one. */
export function stepCautions(warnings: readonly Warning[], t: TFunction, show: Show): string[] {
  return warnings.map((w) =>
    w.stepIndex === undefined
      ? wordWarning(t, w, show)
      : t('app.cycle.stepCaution', { n: w.stepIndex + 1, message: wordWarning(t, w, show) }),
  );
}
