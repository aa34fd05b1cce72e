/**
 * The outcome of reading a form and calling physics: a result, or errors placed
 * beside the fields that caused them (by the physics error's `field`, readForm.ts).
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
