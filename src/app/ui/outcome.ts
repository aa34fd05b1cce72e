/**
 * The outcome of reading a form and calling physics: a result, or errors placed
 * beside the fields that caused them (by the physics error's `field`).
 */
import type { InputError, Result } from '../../physics';

export interface Outcome<T> {
  /** Errors by form field name. */
  errors: Record<string, InputError>;
  /** An error that belongs to no single field. */
  general?: InputError;
  result?: T;
}

/** The errors of an outcome without any: one object, so fields given it are not redrawn for a new result. */
export const NO_ERRORS: Record<string, InputError> = Object.freeze({});

/** Collects field reads; `value` returns undefined for a failed read and records its error. */
export class FieldReader {
  readonly errors: Record<string, InputError> = {};

  value<T>(read: Result<T>): T | undefined {
    if (read.ok) return read.value;
    const name = read.error.field ?? '';
    if (!(name in this.errors)) this.errors[name] = read.error;
    return undefined;
  }

  get failed(): boolean {
    return Object.keys(this.errors).length > 0;
  }
}

/**
 * Places a physics error: on the form field its `field` maps to (through `fieldMap`,
 * or as is when the form has a field of that name), otherwise as a general error.
 */
export function placeError<T>(
  error: InputError,
  fieldMap: Record<string, string>,
  formFields: ReadonlySet<string>,
): Outcome<T> {
  const raw = error.field ?? '';
  const mapped = fieldMap[raw] ?? raw;
  return formFields.has(mapped) ? { errors: { [mapped]: error } } : { errors: NO_ERRORS, general: error };
}
