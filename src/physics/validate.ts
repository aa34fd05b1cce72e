/**
 * Reading untrusted requests (CLI JSON, form state) into typed values.
 * Every failure is a typed error naming the field; nothing here throws.
 */
import { DEFAULT_MODEL, isModelId, type DiffusivityModelId } from './diffusivity';
import { fail, ok, type ErrorCode, type Result } from './result';
import {
  ALLOY_ELEMENT_MAX_PCT,
  ALLOY_ELEMENTS,
  EUTECTOID_TEMP_C,
  hasAustenite,
  MAX_CARBON_PCT,
  type Composition,
} from './steel';
import { parseNumber } from './units';

/**
 * Carburizing temperatures accepted as input, °C: above A1 (`min` itself excluded: at or below
 * it there is no austenite, and the answer is the plain `temperature.noAustenite`, not a range
 * error) and up to `max` (beyond the models).
 */
export const TEMPERATURE_LIMITS_C = { min: EUTECTOID_TEMP_C, max: 1150 } as const;
/** Longest cycle accepted, h (a very long pit-furnace cycle is well under this). */
export const MAX_TIME_H = 1000;
/** Deepest case accepted, mm. */
export const MAX_DEPTH_MM = 10;

export type Fields = Record<string, unknown>;

export function asFields(request: unknown): Result<Fields> {
  return typeof request === 'object' && request !== null && !Array.isArray(request)
    ? ok(request as Fields)
    : fail('request.notObject');
}

/** Untrusted input as text for a message: text as typed, anything else as JSON, cut to 40 characters. */
export function shownValue(raw: unknown): string {
  const text =
    typeof raw === 'string'
      ? raw
      : typeof raw === 'object'
        ? JSON.stringify(raw)
        : typeof raw === 'number' || typeof raw === 'boolean' || typeof raw === 'bigint'
          ? String(raw)
          : typeof raw; // undefined, a function or a symbol: none comes from JSON or a form
  return text.length > 40 ? `${text.slice(0, 39)}…` : text;
}

/** A number given as a JSON number or as text (`"0,8"` accepted). */
const isBlank = (raw: unknown) => raw === undefined || raw === null || (typeof raw === 'string' && raw.trim() === '');

export function readNumber(fields: Fields, field: string): Result<number> {
  const raw = fields[field];
  if (isBlank(raw)) return fail('field.missing', field);
  if (typeof raw === 'number') return Number.isFinite(raw) ? ok(raw) : fail('field.notNumber', field);
  if (typeof raw === 'string') {
    const parsed = parseNumber(raw);
    return parsed.ok ? parsed : fail(parsed.error.code, field, { text: raw });
  }
  return fail('field.notNumber', field);
}

export function readOptionalNumber(fields: Fields, field: string): Result<number | undefined> {
  return isBlank(fields[field]) ? ok(undefined) : readNumber(fields, field);
}

function inRange(value: number, field: string, min: number, max: number, code: ErrorCode): Result<number> {
  return value >= min && value <= max ? ok(value) : fail(code, field, { value, min, max });
}

/** A temperature to carburize at: above A1, at most TEMPERATURE_LIMITS_C.max. */
export function checkTemperatureC(value: number, field: string): Result<number> {
  const { min, max } = TEMPERATURE_LIMITS_C;
  if (value > max) return fail('temperature.outOfRange', field, { value, min, max });
  return hasAustenite(value) ? ok(value) : fail('temperature.noAustenite', field, { value, limitC: EUTECTOID_TEMP_C });
}

export function checkTimeH(value: number, field: string): Result<number> {
  if (!(value > 0)) return fail('time.notPositive', field, { value });
  return value <= MAX_TIME_H ? ok(value) : fail('time.tooLong', field, { value, max: MAX_TIME_H });
}

export function checkCarbonPct(value: number, field: string): Result<number> {
  if (value < 0) return fail('carbon.negative', field, { value });
  return value <= MAX_CARBON_PCT ? ok(value) : fail('carbon.aboveMax', field, { value, max: MAX_CARBON_PCT });
}

export function checkDepthMm(value: number, field: string): Result<number> {
  if (!(value > 0)) return fail('depth.notPositive', field, { value });
  return value <= MAX_DEPTH_MM ? ok(value) : fail('depth.tooDeep', field, { value, max: MAX_DEPTH_MM });
}

/** Furnace calibration factor on D; beyond these a fit means a wrong record or model, not a furnace. */
export const DIFFUSIVITY_FACTOR_LIMITS = { min: 0.1, max: 10 } as const;

export function checkDiffusivityFactor(value: number, field: string): Result<number> {
  const { min, max } = DIFFUSIVITY_FACTOR_LIMITS;
  return inRange(value, field, min, max, 'diffusivityFactor.outOfRange');
}

/** Largest total-case margin above core carbon accepted, %C. */
export const MAX_TOTAL_CASE_MARGIN_PCT = 1;

export function checkTotalCaseMargin(value: number, field: string): Result<number> {
  return value > 0 && value <= MAX_TOTAL_CASE_MARGIN_PCT
    ? ok(value)
    : fail('totalCaseMargin.outOfRange', field, { value, max: MAX_TOTAL_CASE_MARGIN_PCT });
}

/** Widest furnace temperature tolerance accepted for the uncertainty band, ±°C. */
export const MAX_TEMPERATURE_TOLERANCE_C = 50;

export function checkTemperatureTolerance(value: number, field: string): Result<number> {
  return inRange(value, field, 0, MAX_TEMPERATURE_TOLERANCE_C, 'temperatureTolerance.outOfRange');
}

export function checkBeta(value: number, field: string): Result<number> {
  return value > 0 ? ok(value) : fail('beta.notPositive', field, { value });
}

/** Reads a number field and applies a range check to it. */
export function readChecked(
  fields: Fields,
  field: string,
  check: (value: number, field: string) => Result<number>,
): Result<number> {
  const value = readNumber(fields, field);
  return value.ok ? check(value.value, field) : value;
}

export function readModel(fields: Fields, field = 'model'): Result<DiffusivityModelId> {
  const raw = fields[field];
  if (raw === undefined || raw === null || raw === '') return ok(DEFAULT_MODEL);
  return isModelId(raw) ? ok(raw) : fail('model.unknown', field, { model: shownValue(raw) });
}

/** An optional composition object `{Si, Mn, Cr, Ni, Mo}` in wt%; missing elements count as 0. */
export function readComposition(fields: Fields, field = 'composition'): Result<Composition | undefined> {
  const raw = fields[field];
  if (raw === undefined || raw === null) return ok(undefined);
  const obj = asFields(raw);
  if (!obj.ok) return fail('composition.notObject', field);
  const unknown = Object.keys(obj.value).find((k) => !(ALLOY_ELEMENTS as readonly string[]).includes(k));
  if (unknown !== undefined) return fail('composition.unknownElement', `${field}.${unknown}`, { element: unknown });
  const composition: Composition = { Si: 0, Mn: 0, Cr: 0, Ni: 0, Mo: 0 };
  for (const element of ALLOY_ELEMENTS) {
    const value = readOptionalNumber(obj.value, element);
    if (!value.ok) return fail(value.error.code, `${field}.${element}`, value.error.params);
    const pct = value.value ?? 0;
    if (pct < 0 || pct > ALLOY_ELEMENT_MAX_PCT) {
      return fail('composition.outOfRange', `${field}.${element}`, { element, value: pct, max: ALLOY_ELEMENT_MAX_PCT });
    }
    composition[element] = pct;
  }
  return ok(composition);
}
