/** Words a physics error for the screen: every figure in the units the user has chosen, in the locale's notation. */
import type { TFunction } from 'i18next';
import { messageFigures, wordError as wordPhysicsError } from '../../i18n/wording';
import type { InputError } from '../../physics';
import type { DisplayUnits } from './units';

export function wordError(t: TFunction, error: InputError, units: DisplayUnits, locale: string): string {
  return wordPhysicsError(t, error, messageFigures(units, locale));
}
