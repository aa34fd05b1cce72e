/**
 * Reading untrusted requests (CLI JSON, form state) into typed values.
 * Every failure is a typed error naming the field; nothing here throws.
 */
import { DEFAULT_MODEL, isModelId, type DiffusivityModelId } from './diffusivity';
import { fail, ok, type Result } from './result';
import { checkLimit, LIMITS } from './limits';
import { ALLOY_ELEMENTS, type Composition } from './steel';
import { parseNumber } from './units';

/** Carburizing temperatures accepted, °C: above A1 (`min` itself excluded), up to `max`. */
export const TEMPERATURE_LIMITS_C = { min: LIMITS.temperature.min, max: LIMITS.temperature.max } as const;
/** Longest time accepted, h. */
export const MAX_TIME_H = LIMITS.time.max;
/** Deepest case accepted, mm. */
export const MAX_DEPTH_MM = LIMITS.depth.max;

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

/** A temperature to carburize at: above A1 (else `temperature.noAustenite`), up to the hottest accepted. */
export const checkTemperatureC = (value: number, field: string) => checkLimit(LIMITS.temperature, value, field);
export const checkTimeH = (value: number, field: string) => checkLimit(LIMITS.time, value, field);
export const checkCarbonPct = (value: number, field: string) => checkLimit(LIMITS.carbon, value, field);
export const checkDepthMm = (value: number, field: string) => checkLimit(LIMITS.depth, value, field);

/** Furnace calibration factor on D. */
export const DIFFUSIVITY_FACTOR_LIMITS = {
  min: LIMITS.diffusivityFactor.min,
  max: LIMITS.diffusivityFactor.max,
} as const;
export const checkDiffusivityFactor = (value: number, field: string) =>
  checkLimit(LIMITS.diffusivityFactor, value, field);

/** Largest total-case margin above core carbon accepted, %C. */
export const MAX_TOTAL_CASE_MARGIN_PCT = LIMITS.totalCaseMargin.max;
export const checkTotalCaseMargin = (value: number, field: string) => checkLimit(LIMITS.totalCaseMargin, value, field);

/** Widest furnace temperature tolerance accepted for the uncertainty band, ±°C. */
export const MAX_TEMPERATURE_TOLERANCE_C = LIMITS.temperatureTolerance.max;
export const checkTemperatureTolerance = (value: number, field: string) =>
  checkLimit(LIMITS.temperatureTolerance, value, field);

export const checkBeta = (value: number, field: string) => checkLimit(LIMITS.beta, value, field);

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
    const pct = checkLimit(LIMITS.alloyElement, value.value ?? 0, `${field}.${element}`, { element });
    if (!pct.ok) return pct;
    composition[element] = pct.value;
  }
  return ok(composition);
}
