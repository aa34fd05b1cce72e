/**
 * The unit of every figure an error or a warning carries, so whoever words it (the CLI in °C, mm
 * and h; the app in the user's units and locale) formats each figure with its unit and the
 * message itself holds none. A range error's `value`, `min` and `max` are in its limit's unit
 * (limits.ts); a code used by several limits has one unit (a test checks it); other figures are
 * named with their unit.
 */
import { LIMITS, type ValueUnit } from './limits';
import type { ErrorCode, WarningCode } from './result';

export type ParamUnits = Readonly<Record<string, ValueUnit>>;

const rangeUnits = (unit: ValueUnit): ParamUnits => ({ value: unit, min: unit, max: unit });

/** Each limit's codes take its unit for `value`, `min` and `max`. */
const FROM_LIMITS: Partial<Record<ErrorCode, ParamUnits>> = Object.fromEntries(
  Object.values(LIMITS).flatMap((limit) => [
    [limit.below, rangeUnits(limit.unit)],
    [limit.above, rangeUnits(limit.unit)],
  ]),
);

/**
 * Figures whose names say no unit (`value`, `previous`), beyond the limits' own; every other
 * figure of a message is named with its unit (`depthMm`, `limitPct`, `tempC`, `totalH`).
 */
export const ERROR_PARAM_UNITS: Partial<Record<ErrorCode, ParamUnits>> = {
  ...FROM_LIMITS,
  'time.limitTooShort': { value: 'h', min: 'h' },
  'traverse.depthNegative': { value: 'mm' },
  'traverse.depthRepeated': { value: 'mm' },
  'traverse.depthNotIncreasing': { value: 'mm', previous: 'mm' },
};

/**
 * The unit a name's suffix says, by the project's rule of units in names: `…Mm` mm, `…Pct` %C,
 * `…C` °C (`deltaC`, a change, °C difference), `…H` h.
 */
export function unitOfName(name: string): ValueUnit | undefined {
  if (name === 'deltaC') return 'dC';
  if (name.endsWith('Mm')) return 'mm';
  if (name.endsWith('Pct')) return '%C';
  if (/[a-z0-9]C$/u.test(name)) return 'C';
  if (/[a-z]H$/u.test(name)) return 'h';
  return undefined;
}

/** The unit of a request field (`steps.2.durationH`, `targetEcdMm.max`): its deepest part that names one. */
function unitOfField(field: string | undefined): ValueUnit | undefined {
  for (const part of field?.split('.').reverse() ?? []) {
    const unit = unitOfName(part);
    if (unit) return unit;
  }
  return undefined;
}

const UNNAMED = ['value', 'min', 'max', 'previous'];

/**
 * The unit of one figure of an error or a warning: the code's (a limit's, or listed above), else
 * its name's, else, for `value`, `min`, `max` (a range of no one unit, `range.minAboveMax`), the
 * unit its field names; a figure of none is a plain number (a count, a hardness in its own scale).
 */
export function paramUnit(code: ErrorCode | WarningCode, name: string, field?: string): ValueUnit | undefined {
  const listed = (ERROR_PARAM_UNITS as Partial<Record<string, ParamUnits>>)[code]?.[name];
  if (listed) return listed;
  if (UNNAMED.includes(name)) return unitOfField(field);
  return unitOfName(name);
}
