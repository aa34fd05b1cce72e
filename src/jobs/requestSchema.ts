/**
 * Valibot schemas built from physics' request descriptions (physics `REQUESTS`): a stored request
 * holds exactly the fields physics reads, as numbers within the same limits, texts within the same
 * lengths, lists within the same counts. A limit changed in physics changes what the log accepts.
 */
import * as v from 'valibot';
import {
  ALLOY_ELEMENTS,
  CONVERTIBLE_HARDNESS_RANGE,
  HARDNESS_SCALE_RANGE,
  HARDNESS_UNITS,
  LIMITS,
  type FieldSpec,
  type FieldsSpec,
  type Limit,
  type RequestOf,
} from '../physics';

/** A finite number within a limit (an excluded end refused). */
export function limitSchema(limit: Limit): v.GenericSchema<number> {
  return v.pipe(
    v.number(),
    v.finite(),
    limit.minExcluded ? v.gtValue(limit.min) : v.minValue(limit.min),
    limit.maxExcluded ? v.ltValue(limit.max) : v.maxValue(limit.max),
  );
}

const elementSchema = limitSchema(LIMITS.alloyElement);
/** A composition as stored: every element given. */
export const CompositionSchema = v.strictObject(
  Object.fromEntries(ALLOY_ELEMENTS.map((e) => [e, elementSchema])) as Record<
    (typeof ALLOY_ELEMENTS)[number],
    typeof elementSchema
  >,
);

function hardnessSchema(range: 'scale' | 'convertible') {
  const ranges = range === 'convertible' ? CONVERTIBLE_HARDNESS_RANGE : HARDNESS_SCALE_RANGE;
  return v.pipe(
    v.strictObject({ value: v.pipe(v.number(), v.finite()), unit: v.picklist(HARDNESS_UNITS) }),
    v.check((h) => h.value >= ranges[h.unit].min && h.value <= ranges[h.unit].max, 'hardness outside its scale'),
  );
}

/** Whether a request may leave the field out (the reader then fills it or does without). */
function mayLeaveOut(spec: FieldSpec): boolean {
  switch (spec.type) {
    case 'number':
      return spec.optional === true || spec.default !== undefined || spec.defaultFrom !== undefined;
    case 'choice':
      return spec.optional === true || spec.default !== undefined;
    case 'object':
      return spec.optional === true;
    case 'list':
      return false;
    case 'text':
    case 'composition':
    case 'hardness':
    case 'variant':
      return true;
  }
}

function fieldSchema(spec: FieldSpec): v.GenericSchema {
  switch (spec.type) {
    case 'number': {
      const number = spec.limit ? limitSchema(spec.limit) : v.pipe(v.number(), v.finite());
      return spec.nullable ? v.nullable(number) : number;
    }
    case 'text':
      return v.pipe(v.string(), v.maxLength(spec.maxLength));
    case 'choice':
      return v.picklist(spec.options);
    case 'composition':
      return CompositionSchema;
    case 'hardness':
      return hardnessSchema(spec.range);
    case 'object':
      return objectSchema(spec.fields);
    case 'list': {
      const items = v.pipe(v.array(fieldSchema(spec.item)), v.minLength(spec.min));
      return spec.max === undefined ? items : v.pipe(items, v.maxLength(spec.max));
    }
    case 'variant':
      return v.variant(
        'kind',
        Object.entries(spec.options).map(([kind, fields]) =>
          v.strictObject({ kind: v.literal(kind), ...entriesOf(fields) }),
        ),
      );
  }
}

function entriesOf(fields: FieldsSpec): Record<string, v.GenericSchema> {
  return Object.fromEntries(
    Object.entries(fields).map(([name, spec]) => {
      const schema = fieldSchema(spec);
      return [name, mayLeaveOut(spec) ? v.optional(schema) : schema];
    }),
  );
}

function objectSchema(fields: FieldsSpec): v.GenericSchema {
  return v.strictObject(entriesOf(fields));
}

/** The stored form of a request: its fields as its description gives them, and no others. */
export function requestSchema<F extends FieldsSpec>(fields: F): v.GenericSchema<RequestOf<F>> {
  return objectSchema(fields) as v.GenericSchema<RequestOf<F>>;
}

/** A request's entries, to spread into an object schema beside others (the job's `kind`). */
export function requestEntries(fields: FieldsSpec): Record<string, v.GenericSchema> {
  return entriesOf(fields);
}
