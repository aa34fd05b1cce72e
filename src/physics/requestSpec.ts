/**
 * A request described as data: for every field its name, what it holds (a number checked against a
 * limit, a text, a choice, a composition, a hardness, an object, a list or a shape), whether it may
 * be left out and what it then defaults to. `readSpec` reads an untrusted request by that
 * description (numbers as JSON numbers or text with a decimal comma, errors at the field's path);
 * the job record builds its schema from the same description, and the app its form reader.
 */
import { CONVERTIBLE_RANGE, HARDNESS_SCALE_RANGE, type Hardness } from './hardness';
import { checkLimit, type Limit } from './limits';
import { readOptionalHardness } from './readHardness';
import { fail, ok, type ErrorCode, type InputError, type Result } from './result';
import type { Composition } from './steel';
import { asFields, readComposition, readNumber, shownValue, type Fields } from './validate';

export interface NumberSpec {
  readonly type: 'number';
  /** The range it is checked against; none for a value of any size (the `convert` value). */
  readonly limit?: Limit;
  readonly optional?: boolean;
  /** Taken when the field is left out. */
  readonly default?: number;
  /** Left out: the value of this field of the same object (a soak gives only its start temperature). */
  readonly defaultFrom?: string;
  /** An explicit null is a value of its own (a neutral-gas step has no carbon potential). */
  readonly nullable?: boolean;
}

/** Free text, trimmed; empty counts as left out; longer than `maxLength` is refused. */
export interface TextSpec {
  readonly type: 'text';
  readonly maxLength: number;
}

export interface ChoiceSpec {
  readonly type: 'choice';
  readonly options: readonly string[];
  readonly optional?: boolean;
  readonly default?: string;
  /** Error of a value not among the options, and the param that names it. */
  readonly unknown: ErrorCode;
  readonly param: string;
}

/** `{Si, Mn, Cr, Ni, Mo}` in wt%, each element checked; missing elements count as 0. Optional. */
export interface CompositionSpec {
  readonly type: 'composition';
}

/** `{value, unit}` in HV or HRC. Optional. `convertible`: within the HRC ↔ HV table (a curve drawn in HRC needs it). */
export interface HardnessSpec {
  readonly type: 'hardness';
  readonly range: 'scale' | 'convertible';
}

export interface ObjectSpec {
  readonly type: 'object';
  readonly fields: FieldsSpec;
  readonly optional?: boolean;
}

export interface ListSpec {
  readonly type: 'list';
  readonly item: FieldSpec;
  readonly min: number;
  /** Not a list, or fewer than `min` items (`{min}`). */
  readonly tooFew: ErrorCode;
  /** At most this many items, else `tooMany` (`{count, max}`). */
  readonly max?: number;
  readonly tooMany?: ErrorCode;
}

/** An object whose `kind` picks its other fields (a part shape). Left out: `default`. */
export interface VariantSpec {
  readonly type: 'variant';
  readonly options: Readonly<Record<string, FieldsSpec>>;
  readonly default: string;
  readonly unknown: ErrorCode;
}

export type FieldSpec =
  NumberSpec | TextSpec | ChoiceSpec | CompositionSpec | HardnessSpec | ObjectSpec | ListSpec | VariantSpec;

export type FieldsSpec = Readonly<Record<string, FieldSpec>>;

// The TypeScript types a description stands for: `ReadOf` what a reader returns (defaults filled
// in), `RequestOf` what may be sent or stored (numbers as numbers; defaulted fields may be left out).

type Filled<S> = S extends { default: unknown } | { defaultFrom: string } ? true : false;
type LeftOut<S> = S extends TextSpec | CompositionSpec | HardnessSpec
  ? true
  : S extends { optional: true }
    ? true
    : false;

type ValueOf<S, Mode extends 'read' | 'request'> = S extends NumberSpec
  ? S extends { nullable: true }
    ? number | null
    : number
  : S extends TextSpec
    ? string
    : S extends { type: 'choice'; options: readonly (infer O)[] }
      ? O
      : S extends CompositionSpec
        ? Composition
        : S extends HardnessSpec
          ? Hardness
          : S extends { type: 'object'; fields: infer F }
            ? ObjectOf<F, Mode>
            : S extends { type: 'list'; item: infer I }
              ? ValueOf<I, Mode>[]
              : S extends { type: 'variant'; options: infer O }
                ? { [K in keyof O]: { kind: K } & ObjectOf<O[K], Mode> }[keyof O]
                : never;

type OptionalKeys<F, Mode> = {
  [K in keyof F]: LeftOut<F[K]> extends true
    ? true extends Filled<F[K]>
      ? Mode extends 'request'
        ? K
        : never
      : K
    : Mode extends 'request'
      ? Filled<F[K]> extends true
        ? K
        : F[K] extends VariantSpec
          ? K
          : never
      : never;
}[keyof F];

type Simplify<T> = { [K in keyof T]: T[K] } & {};

export type ObjectOf<F, Mode extends 'read' | 'request'> = Simplify<
  { -readonly [K in Exclude<keyof F, OptionalKeys<F, Mode>>]: ValueOf<F[K], Mode> } & {
    -readonly [K in OptionalKeys<F, Mode>]?: ValueOf<F[K], Mode>;
  }
>;

/** What a reader of these fields returns, every default filled in. */
export type ReadOf<F extends FieldsSpec> = ObjectOf<F, 'read'>;
/** A request of these fields as JSON may carry it (and the job record stores it). */
export type RequestOf<F extends FieldsSpec> = ObjectOf<F, 'request'>;

// Building descriptions: `const` type parameters keep `optional: true` and the like as literal types.

export const num = <const O extends Omit<NumberSpec, 'type' | 'limit'>>(limit?: Limit, options?: O) =>
  ({ type: 'number', ...(limit ? { limit } : {}), ...options }) as { type: 'number'; limit?: Limit } & O;
export const text = (maxLength: number): TextSpec => ({ type: 'text', maxLength });
export const choice = <const O extends readonly string[], const X extends Omit<ChoiceSpec, 'type' | 'options'>>(
  options: O,
  extra: X,
) => ({ type: 'choice', options, ...extra }) as { type: 'choice'; options: O } & X;
export const composition = (): CompositionSpec => ({ type: 'composition' });
export const hardness = (range: HardnessSpec['range']): HardnessSpec => ({ type: 'hardness', range });
export const object = <const F extends FieldsSpec, const X extends { optional?: boolean }>(fields: F, extra?: X) =>
  ({ type: 'object', fields, ...extra }) as { type: 'object'; fields: F } & X;
export const list = <const I extends FieldSpec>(item: I, bounds: Omit<ListSpec, 'type' | 'item'>) =>
  ({ type: 'list', item, ...bounds }) as { type: 'list'; item: I } & Omit<ListSpec, 'type' | 'item'>;
export const variant = <const O extends Readonly<Record<string, FieldsSpec>>>(
  options: O,
  extra: Omit<VariantSpec, 'type' | 'options'>,
) =>
  ({ type: 'variant', options, ...extra }) as { type: 'variant'; options: O } & Omit<VariantSpec, 'type' | 'options'>;

// Reading.

/** Re-labels an error with the path of the object it came from. */
export function under<T>(prefix: string, result: Result<T>): Result<T> {
  if (result.ok) return result;
  const e: InputError = result.error;
  return fail(e.code, e.field === undefined ? prefix : `${prefix}.${e.field}`, e.params);
}

const isBlank = (raw: unknown) => raw === undefined || raw === null || (typeof raw === 'string' && raw.trim() === '');

/** One field of an object; `undefined` in the value means left out (the key is then not set). */
function readField(spec: FieldSpec, name: string, fields: Fields, done: Fields): Result<unknown> {
  const raw = fields[name];
  switch (spec.type) {
    case 'number': {
      if (raw === null && spec.nullable) return ok(null);
      if (isBlank(raw)) {
        const fallback = spec.defaultFrom === undefined ? spec.default : (done[spec.defaultFrom] as number | undefined);
        if (fallback !== undefined) return spec.limit ? checkLimit(spec.limit, fallback, name) : ok(fallback);
        if (spec.optional) return ok(undefined);
      }
      const value = readNumber(fields, name);
      if (!value.ok || !spec.limit) return value;
      return checkLimit(spec.limit, value.value, name);
    }
    case 'text': {
      if (typeof raw !== 'string' || raw.trim() === '') return ok(undefined);
      const trimmed = raw.trim();
      return trimmed.length <= spec.maxLength
        ? ok(trimmed)
        : fail('text.tooLong', name, { length: trimmed.length, max: spec.maxLength });
    }
    case 'choice': {
      if (raw === undefined || raw === null || raw === '') {
        if (spec.default !== undefined) return ok(spec.default);
        return spec.optional ? ok(undefined) : fail('field.missing', name);
      }
      return typeof raw === 'string' && spec.options.includes(raw)
        ? ok(raw)
        : fail(spec.unknown, name, { [spec.param]: shownValue(raw) });
    }
    case 'composition':
      return readComposition(fields, name);
    case 'hardness':
      return under(
        name,
        readOptionalHardness(raw, undefined, spec.range === 'convertible' ? CONVERTIBLE_RANGE : HARDNESS_SCALE_RANGE),
      );
    case 'object': {
      if (raw === undefined || raw === null) return spec.optional ? ok(undefined) : fail('field.missing', name);
      const inner = asFields(raw);
      return under(name, inner.ok ? readFields(spec.fields, inner.value) : inner);
    }
    case 'list':
      return under(name, readList(spec, raw));
    case 'variant':
      return under(name, readVariant(spec, raw));
  }
}

function readList(spec: ListSpec, raw: unknown): Result<unknown[]> {
  if (!Array.isArray(raw) || raw.length < spec.min) return fail(spec.tooFew, undefined, { min: spec.min });
  if (spec.max !== undefined && spec.tooMany !== undefined && raw.length > spec.max)
    return fail(spec.tooMany, undefined, { count: raw.length, max: spec.max });
  const items: unknown[] = [];
  for (let i = 0; i < raw.length; i++) {
    const item = readField(spec.item, String(i), raw as unknown as Fields, {});
    // A message about one item names it (`Reading {{index}}`).
    if (!item.ok) return fail(item.error.code, item.error.field, { index: i, ...item.error.params });
    items.push(item.value);
  }
  return ok(items);
}

function readVariant(spec: VariantSpec, raw: unknown): Result<Fields> {
  if (raw === undefined || raw === null) return ok({ kind: spec.default });
  const fields = asFields(raw);
  if (!fields.ok) return fail(spec.unknown, 'kind', { kind: shownValue(raw) });
  const kind = fields.value.kind;
  if (kind === undefined || kind === null || kind === '') return fail('field.missing', 'kind');
  const option = typeof kind === 'string' && Object.hasOwn(spec.options, kind) ? spec.options[kind] : undefined;
  if (!option) return fail(spec.unknown, 'kind', { kind: shownValue(kind) });
  const read = readFields(option, fields.value);
  return read.ok ? ok({ kind, ...read.value }) : read;
}

/** Every field of `spec` from `fields`, in the order the description lists them; unknown keys are ignored. */
export function readFields(spec: FieldsSpec, fields: Fields): Result<Fields> {
  const out: Fields = {};
  for (const [name, field] of Object.entries(spec)) {
    const value = readField(field, name, fields, out);
    if (!value.ok) return value;
    if (value.value !== undefined) out[name] = value.value;
  }
  return ok(out);
}

/** An untrusted request read by its description, typed as the description says. */
export function readRequest<F extends FieldsSpec>(spec: F, request: unknown): Result<ReadOf<F>> {
  const fields = asFields(request);
  return fields.ok ? (readFields(spec, fields.value) as Result<ReadOf<F>>) : fields;
}

/** The description of the field at a dotted path (`steps.2.durationH`, `boost.temperatureC`), if there is one. */
export function specAt(spec: FieldsSpec, path: string): FieldSpec | undefined {
  let fields: FieldsSpec | undefined = spec;
  let found: FieldSpec | undefined;
  for (const part of path.split('.')) {
    if (found?.type === 'list') {
      if (!/^\d+$/u.test(part)) return undefined;
      found = found.item;
      fields = found.type === 'object' ? found.fields : undefined;
      continue;
    }
    if (found?.type === 'variant') {
      // Any shape's field of that name (the size fields of plate and bar differ by name).
      found = Object.values(found.options).find((o) => Object.hasOwn(o, part))?.[part];
      fields = found?.type === 'object' ? found.fields : undefined;
      continue;
    }
    if (!fields || !Object.hasOwn(fields, part)) return undefined;
    found = fields[part];
    fields = found?.type === 'object' ? found.fields : undefined;
  }
  return found;
}
