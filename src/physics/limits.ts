/**
 * Every range a request value is checked against, written once: its unit, its ends (whether an
 * end itself is refused) and the error code on each side. The readers, the job record's schema,
 * the app's form reader and the words of an error all take a limit from here, so changing one
 * changes them together. Every range error carries `{value, min, max}` in the limit's unit.
 */
import { fail, ok, type ErrorCode, type Result } from './result';
import { ALLOY_ELEMENT_MAX_PCT, EUTECTOID_TEMP_C, MAX_CARBON_PCT } from './steel';

/**
 * The unit of a value at the request boundary: °C, a temperature difference in °C, h, mm, wt%
 * carbon, wt% of an alloying element, m/s, or a plain ratio.
 */
export type ValueUnit = 'C' | 'dC' | 'h' | 'mm' | '%C' | '%' | 'm/s' | 'ratio';

export interface Limit {
  unit: ValueUnit;
  min: number;
  /** `min` itself is refused (a time or a depth must be more than zero). */
  minExcluded?: boolean;
  max: number;
  maxExcluded?: boolean;
  /** Code of a value below `min` (or at it, when excluded) and above `max`. */
  below: ErrorCode;
  above: ErrorCode;
}

/** Hottest temperature accepted anywhere, °C (beyond the diffusivity models; the Acm table ends here). */
const HOTTEST_C = 1150;

export const LIMITS = {
  /**
   * A temperature to carburize at: above A1 (at or below it there is no austenite, and the answer
   * is the plain `temperature.noAustenite`, not a range error), up to the hottest accepted.
   */
  temperature: {
    unit: 'C',
    min: EUTECTOID_TEMP_C,
    minExcluded: true,
    max: HOTTEST_C,
    below: 'temperature.noAustenite',
    above: 'temperature.outOfRange',
  },
  /** A recipe step's (or the hardening soak's) temperature: from a cold load up; no austenite is a caution there. */
  stepTemperature: {
    unit: 'C',
    min: 0,
    max: HOTTEST_C,
    below: 'temperature.outOfRange',
    above: 'temperature.outOfRange',
  },
  /** A furnace reading of a temperature history. */
  historyTemperature: {
    unit: 'C',
    min: 0,
    max: HOTTEST_C,
    below: 'history.temperatureTooHigh',
    above: 'history.temperatureTooHigh',
  },
  /** The clock time of a furnace reading, from the start of the history (its order is checked by the reader). */
  historyTime: {
    unit: 'h',
    min: 0,
    max: Number.POSITIVE_INFINITY,
    below: 'history.notIncreasing',
    above: 'history.notIncreasing',
  },
  /** A time at temperature, a step or a cycle: more than zero, at most 1000 h (a very long pit-furnace cycle is well under it). */
  time: { unit: 'h', min: 0, minExcluded: true, max: 1000, below: 'time.notPositive', above: 'time.tooLong' },
  /** Carbon content or potential: up to the eutectic point. */
  carbon: { unit: '%C', min: 0, max: MAX_CARBON_PCT, below: 'carbon.negative', above: 'carbon.aboveMax' },
  /** A case depth: more than zero, at most 10 mm. */
  depth: { unit: 'mm', min: 0, minExcluded: true, max: 10, below: 'depth.notPositive', above: 'depth.tooDeep' },
  /** Furnace calibration factor on D; beyond these a fit means a wrong record or model, not a furnace. */
  diffusivityFactor: {
    unit: 'ratio',
    min: 0.1,
    max: 10,
    below: 'diffusivityFactor.outOfRange',
    above: 'diffusivityFactor.outOfRange',
  },
  /** Total case ends this far above core carbon; zero would put it at infinite depth. */
  totalCaseMargin: {
    unit: '%C',
    min: 0,
    minExcluded: true,
    max: 1,
    below: 'totalCaseMargin.outOfRange',
    above: 'totalCaseMargin.outOfRange',
  },
  /** Furnace temperature tolerance for the likely range, ±°C. */
  temperatureTolerance: {
    unit: 'dC',
    min: 0,
    max: 50,
    below: 'temperatureTolerance.outOfRange',
    above: 'temperatureTolerance.outOfRange',
  },
  /** Carbon transfer coefficient: any positive value. */
  beta: {
    unit: 'm/s',
    min: 0,
    minExcluded: true,
    max: Number.POSITIVE_INFINITY,
    below: 'beta.notPositive',
    above: 'beta.notPositive',
  },
  /** Plate thickness or bar diameter. */
  shapeSize: { unit: 'mm', min: 0.1, max: 1000, below: 'shape.sizeOutOfRange', above: 'shape.sizeOutOfRange' },
  /** One alloying element, beyond carburizing grades (keeps the alloy factor in range). */
  alloyElement: {
    unit: '%',
    min: 0,
    max: ALLOY_ELEMENT_MAX_PCT,
    below: 'composition.outOfRange',
    above: 'composition.outOfRange',
  },
} as const satisfies Record<string, Limit>;

export type LimitId = keyof typeof LIMITS;

export function withinLimit(limit: Limit, value: number): boolean {
  const aboveMin = limit.minExcluded ? value > limit.min : value >= limit.min;
  const belowMax = limit.maxExcluded ? value < limit.max : value <= limit.max;
  return aboveMin && belowMax;
}

/** The value, or the limit's error at `field` with `{value, min, max}` (plus `extra`, e.g. the element). */
export function checkLimit(
  limit: Limit,
  value: number,
  field?: string,
  extra: Record<string, number | string> = {},
): Result<number> {
  if (withinLimit(limit, value)) return ok(value);
  const code = value > limit.max || (limit.maxExcluded === true && value === limit.max) ? limit.above : limit.below;
  return fail(code, field, { ...extra, value, min: limit.min, max: limit.max });
}

/** Longest text kept in a recipe, characters: its name, a step's label, the steel grade. */
export const TEXT_LENGTH_LIMITS = { name: 120, label: 80, grade: 60 } as const;

/** Most steps accepted in one recipe (a real cycle has a handful; the cycle editor offers as many). */
export const MAX_STEPS = 50;
