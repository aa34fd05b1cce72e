/** Words a physics error for the screen: its figures in the units the user has chosen, in the locale's format. */
import type { TFunction } from 'i18next';
import { errorMessage } from '../../i18n/i18n';
import type { InputError } from '../../physics';
import type { Show } from './show';

/** The sentence for an error, with every figure that has a unit in the chosen units. */
export function wordError(t: TFunction, error: InputError, show: Show): string {
  return errorMessage(t, error, show.figure);
}
