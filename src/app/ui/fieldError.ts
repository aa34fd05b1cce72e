/**
 * Words a physics error for the screen. Messages whose figures carry a unit are
 * re-worded with the figures in the units the user has chosen; the rest use the
 * physics message as it is (errorMessage).
 */
import type { TFunction } from 'i18next';
import { errorMessage } from '../../i18n/i18n';
import { convert, type InputError } from '../../physics';
import { formatQuantity } from './format';
import type { DisplayUnits } from './units';

/** Error codes whose params are in °C / mm / h, and which params they are. */
const UNIT_PARAMS: Partial<
  Record<InputError['code'], { quantity: keyof DisplayUnits; physicsUnit: string; params: string[] }>
> = {
  'temperature.outOfRange': { quantity: 'temperature', physicsUnit: 'C', params: ['value', 'min', 'max'] },
  'temperature.noAustenite': { quantity: 'temperature', physicsUnit: 'C', params: ['value', 'min'] },
  'solve.temperatureBelowRange': { quantity: 'temperature', physicsUnit: 'C', params: ['minC', 'maxC'] },
  'solve.temperatureAboveRange': { quantity: 'temperature', physicsUnit: 'C', params: ['minC', 'maxC'] },
  'depth.tooDeep': { quantity: 'depth', physicsUnit: 'mm', params: ['value', 'max'] },
  'time.tooLong': { quantity: 'time', physicsUnit: 'h', params: ['value', 'max'] },
  'traverse.depthNegative': { quantity: 'depth', physicsUnit: 'mm', params: ['value'] },
  'traverse.depthRepeated': { quantity: 'depth', physicsUnit: 'mm', params: ['value'] },
  'traverse.depthNotIncreasing': { quantity: 'depth', physicsUnit: 'mm', params: ['value', 'previous'] },
};

/** The sentence for an error, with unit-bearing figures in the chosen units. */
export function wordError(t: TFunction, error: InputError, units: DisplayUnits, locale: string): string {
  const rule = UNIT_PARAMS[error.code];
  if (!rule || !error.params) return errorMessage(t, error);
  const unit = units[rule.quantity];
  const params: Record<string, string | number> = { ...error.params };
  for (const name of rule.params) {
    const raw = error.params[name];
    if (typeof raw !== 'number') continue;
    const converted = convert(raw, rule.physicsUnit, unit);
    params[name] = converted.ok ? formatQuantity(converted.value, unit, locale) : raw;
  }
  return t(`app.unitErrors.${error.code}`, params);
}
