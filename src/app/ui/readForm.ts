/**
 * The one form reader: a screen lays its form out as the physics request it stands for (the
 * request's own field names, physics `REQUESTS`), with each input's text as typed where a number
 * goes; this reads every such text by the request's description — parsed (a duration where the
 * unit is a time), converted from the unit it was typed in to the request's unit, checked against
 * the request's limit — and returns the request, the errors by request path, and the paths that
 * are inputs (an error elsewhere is the screen's general error). No screen maps names.
 */
import {
  ALLOY_ELEMENTS,
  checkLimit,
  convertTemperatureDifference,
  LIMITS,
  ok,
  type FieldSpec,
  type FieldsSpec,
  type InputError,
  type Limit,
  type NumberSpec,
  type Result,
  type ValueUnit,
} from '../../physics';
import { readField, type FieldText } from './fieldText';
import { NO_ERRORS, type Outcome } from './outcome';

/** An input's text, and what a blank one stands for (a default from the settings) if not left out. */
export interface FormText extends FieldText {
  fallback?: number;
  /** The screen needs a value where the request may do without one. */
  required?: boolean;
}

/**
 * A form laid out as a request: `FormText`s where numbers go, objects and lists where the request
 * has them, anything else (choices, null, numbers from the settings) as it is sent.
 */
export type FormValue = unknown;
export type FormValues = Readonly<Record<string, FormValue>>;

/** Units a person types that `convert` does not know: β in 10⁻⁷ m/s. */
export const TYPED_SCALE: Partial<Record<ValueUnit, number>> = { 'm/s': 1e-7 };

/** A blank text that stands for a value: the fallback, still placed on the input if refused. */
export const orDefault = (text: FieldText, fallback: number): FormText => ({ ...text, fallback });
/** An input the screen cannot do without (the request could). */
export const required = (text: FieldText): FormText => ({ ...text, required: true });

const isText = (value: unknown): value is FormText =>
  typeof value === 'object' &&
  value !== null &&
  typeof (value as FieldText).text === 'string' &&
  typeof (value as FieldText).unit === 'string';

const isValues = (value: unknown): value is FormValues =>
  typeof value === 'object' && value !== null && !Array.isArray(value) && !isText(value);

/** The typed number in the request's unit for `limit` (as typed when the input has no unit). */
function inRequestUnit(text: FieldText, path: string, limit: Limit | undefined): Result<number> {
  const unit = limit?.unit;
  if (unit === 'dC') {
    const typed = readField({ ...text, unit: '' }, path);
    const from = text.unit;
    return typed.ok && (from === 'F' || from === 'C' || from === 'K' || from === 'R')
      ? ok(convertTemperatureDifference(typed.value, from, 'C'))
      : typed;
  }
  const scale = unit === undefined ? undefined : TYPED_SCALE[unit];
  if (scale !== undefined && text.unit === '') {
    const typed = readField(text, path);
    return typed.ok ? ok(typed.value * scale) : typed;
  }
  // Temperatures, times and depths are typed in the user's units; carbon and ratios as they are.
  return readField(text, path, unit === 'C' || unit === 'h' || unit === 'mm' ? unit : text.unit);
}

/** A number the request cannot do without: a blank input for it is an error here, beside it. */
const needed = (spec: NumberSpec) => !spec.optional && spec.default === undefined && spec.defaultFrom === undefined;

class Reader {
  readonly errors: Record<string, InputError> = {};
  readonly fields = new Set<string>();

  private number(text: FormText, path: string, limit: Limit | undefined, needed: boolean): number | undefined {
    this.fields.add(path);
    if (text.text.trim() === '' && text.fallback === undefined && (needed || text.required)) {
      this.errors[path] ??= { code: 'number.empty', field: path };
      return undefined;
    }
    if (text.text.trim() === '') return text.fallback;
    const value = inRequestUnit(text, path, limit);
    const checked = value.ok && limit ? checkLimit(limit, value.value, path) : value;
    if (checked.ok) return checked.value;
    this.errors[path] ??= checked.error;
    return undefined;
  }

  private composition(values: FormValues, path: string): Record<string, number> {
    const out: Record<string, number> = {};
    for (const element of ALLOY_ELEMENTS) {
      const raw = values[element];
      const at = `${path}.${element}`;
      // A blank element is none of it; the request's check names the element.
      const value = isText(raw) ? this.number({ ...raw, fallback: raw.fallback ?? 0 }, at, undefined, false) : raw;
      if (typeof value === 'number') {
        const checked = checkLimit(LIMITS.alloyElement, value, at, { element });
        if (checked.ok) out[element] = checked.value;
        else this.errors[at] ??= checked.error;
      }
    }
    return out;
  }

  value(spec: FieldSpec, raw: FormValue, path: string): unknown {
    if (raw === undefined) return undefined;
    switch (spec.type) {
      case 'number':
        return isText(raw) ? this.number(raw, path, spec.limit, needed(spec)) : raw;
      case 'composition':
        return isValues(raw) ? this.composition(raw, path) : raw;
      case 'object':
        return isValues(raw) ? this.object(spec.fields, raw, `${path}.`) : raw;
      case 'list':
        return Array.isArray(raw)
          ? (raw as readonly FormValue[]).map((item, i) => this.value(spec.item, item, `${path}.${i}`))
          : raw;
      case 'variant': {
        if (!isValues(raw) || typeof raw.kind !== 'string') return raw;
        const option = spec.options[raw.kind];
        return option ? { kind: raw.kind, ...this.object(option, raw, `${path}.`) } : raw;
      }
      case 'text':
      case 'choice':
      case 'hardness':
        return raw;
    }
  }

  object(spec: FieldsSpec, values: FormValues, prefix: string): Record<string, unknown> {
    const out: Record<string, unknown> = {};
    for (const [name, fieldSpec] of Object.entries(spec)) {
      const value = this.value(fieldSpec, values[name], `${prefix}${name}`);
      if (value !== undefined) out[name] = value;
    }
    return out;
  }
}

export interface FormRead {
  /** The request as read; only to be sent when `errors` is empty. */
  request: Record<string, unknown>;
  /** Errors by request path: what could not be read or is out of its limit. */
  errors: Record<string, InputError>;
  /** The request paths that are inputs of the form. */
  fields: ReadonlySet<string>;
}

/** Reads a form laid out as the request `spec` describes. */
export function readForm(spec: FieldsSpec, values: FormValues): FormRead {
  const reader = new Reader();
  const request = reader.object(spec, values, '');
  return { request, errors: reader.errors, fields: reader.fields };
}

/** A physics error placed: on its input when it has one on the form, otherwise as the general error. */
export function placeError<T>(error: InputError, fields: ReadonlySet<string>): Outcome<T> {
  const path = error.field ?? '';
  return fields.has(path) ? { errors: { [path]: error } } : { errors: NO_ERRORS, general: error };
}
