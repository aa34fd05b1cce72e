/** The upset and its recovery as one line for a job's notes, in the user's language and units. */
import type { TFunction } from 'i18next';
import type { EquivalentTimeResult } from '../../physics';
import type { Show } from '../ui/show';

export function recoveryNote(result: EquivalentTimeResult, t: TFunction, show: Show): string {
  return t('app.recovery.logNote', {
    elapsed: show.hoursMinutes(result.elapsedH),
    equivalent: show.hoursMinutes(result.equivalentTimeH),
    temperature: show.temperature(result.setTemperatureC),
    extra: show.hoursMinutes(result.extraTimeH ?? 0),
  });
}
