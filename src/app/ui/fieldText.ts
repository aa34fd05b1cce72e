/**
 * What a numeric input holds: the text exactly as typed and the unit it was typed
 * in. Values are converted to physics units only when read, so changing the unit
 * setting never rewrites what was typed, and a decimal comma is always accepted.
 */
import {
  convert,
  convertTemperatureDifference,
  fail,
  parseDuration,
  parseNumber,
  quantityOf,
  type Result,
  type TimeUnit,
} from '../../physics';
import { formatInput } from './format';

export interface FieldText {
  text: string;
  /** Unit of the text; '' for unit-less values such as carbon in %. */
  unit: string;
}

export const field = (text: string, unit = ''): FieldText => ({ text, unit });

/** Whether a field in `unit` takes a duration ("1:20", "80 min", "1 h 20") besides a plain number. */
export const takesDuration = (unit: string): boolean => quantityOf(unit) === 'time';

function parseTyped(value: FieldText): Result<number> {
  return takesDuration(value.unit) ? parseDuration(value.text, value.unit as TimeUnit) : parseNumber(value.text);
}

/** The typed value in `toUnit` (or as typed when unit-less), with the field name on any error. */
export function readField(value: FieldText, name: string, toUnit = value.unit): Result<number> {
  const parsed = parseTyped(value);
  if (!parsed.ok) return fail(parsed.error.code, name, parsed.error.params);
  if (value.unit === '' || value.unit === toUnit) return parsed;
  const converted = convert(parsed.value, value.unit, toUnit);
  return converted.ok ? converted : fail(converted.error.code, name, converted.error.params);
}

/** Optional field: empty text reads as undefined. */
export function readOptionalField(value: FieldText, name: string, toUnit = value.unit): Result<number | undefined> {
  return value.text.trim() === '' ? { ok: true, value: undefined } : readField(value, name, toUnit);
}

/** The text to show in an input displayed in `displayUnit`: as typed, or converted when typed in another unit. */
export function displayText(value: FieldText, displayUnit: string, locale: string): string {
  if (value.unit === '' || value.unit === displayUnit) return value.text;
  const parsed = parseTyped(value);
  if (!parsed.ok) return value.text;
  const converted = convert(parsed.value, value.unit, displayUnit);
  return converted.ok ? formatInput(converted.value, displayUnit, locale) : value.text;
}

const isTemperatureUnit = (unit: string): unit is 'C' | 'F' => unit === 'C' || unit === 'F';

/** A temperature difference (a tolerance: no offset) typed in °C or °F, read in °C. */
export function readTemperatureDifferenceC(value: FieldText, name: string): Result<number> {
  const parsed = parseNumber(value.text);
  if (!parsed.ok) return fail(parsed.error.code, name, parsed.error.params);
  return isTemperatureUnit(value.unit)
    ? { ok: true, value: convertTemperatureDifference(parsed.value, value.unit, 'C') }
    : parsed;
}

/** The text of a temperature difference shown in `displayUnit`: as typed, or converted as a difference. */
export function temperatureDifferenceText(value: FieldText, displayUnit: 'C' | 'F', locale: string): string {
  if (!isTemperatureUnit(value.unit) || value.unit === displayUnit) return value.text;
  const parsed = parseNumber(value.text);
  return parsed.ok
    ? formatInput(convertTemperatureDifference(parsed.value, value.unit, displayUnit), displayUnit, locale)
    : value.text;
}
