/** Words a physics caution or planner finding for the screen: every figure in the user's units and locale. */
import type { TFunction } from 'i18next';
import { wordWarning as wordPhysicsWarning } from '../../i18n/wording';
import type { Warning } from '../../physics';
import type { Show } from './show';

export function wordWarning(t: TFunction, warning: Warning, show: Show): string {
  return wordPhysicsWarning(t, warning, show.figures);
}

/** A cycle's cautions, each prefixed with its step when it concerns one. */
export function stepCautions(warnings: readonly Warning[], t: TFunction, show: Show): string[] {
  return warnings.map((w) =>
    w.stepIndex === undefined
      ? wordWarning(t, w, show)
      : t('app.cycle.stepCaution', { n: w.stepIndex + 1, message: wordWarning(t, w, show) }),
  );
}
