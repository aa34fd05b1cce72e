/**
 * Reading a hardness `{value, unit}` from an untrusted request. Field paths are relative to
 * the object read (`value`, `unit`); callers prefix them (`points.3.value`).
 */
import { HARDNESS_SCALE_RANGE, HARDNESS_UNITS, isHardnessUnit, type Hardness, type HardnessUnit } from './hardness';
import { fail, ok, type Result } from './result';
import { asFields, readNumber, shownValue, type Fields } from './validate';

const otherUnit = (unit: HardnessUnit): HardnessUnit => (unit === 'HV' ? 'HRC' : 'HV');

/**
 * A reading outside its scale is refused; when it would fit the other scale (35 under HV),
 * the error names that scale, since a wrong unit is the likely slip.
 */
export function checkHardness(hardness: Hardness, field: string, range = HARDNESS_SCALE_RANGE): Result<Hardness> {
  const { value, unit } = hardness;
  const { min, max } = range[unit];
  if (value >= min && value <= max) return ok(hardness);
  const other = otherUnit(unit);
  const fitsOther = value >= HARDNESS_SCALE_RANGE[other].min && value <= HARDNESS_SCALE_RANGE[other].max;
  return fitsOther
    ? fail('hardness.outsideScaleOtherUnit', field, { value, unit, min, max, otherUnit: other })
    : fail('hardness.outsideScale', field, { value, unit, min, max });
}

/** The `value` and `unit` fields of an object, the value within its scale. */
export function readHardnessFields(fields: Fields, range = HARDNESS_SCALE_RANGE): Result<Hardness> {
  const unit = fields.unit;
  if (!isHardnessUnit(unit)) {
    return unit === undefined || unit === null || unit === ''
      ? fail('field.missing', 'unit')
      : fail('hardness.unknownUnit', 'unit', { unit: shownValue(unit), known: HARDNESS_UNITS.join(', ') });
  }
  const value = readNumber(fields, 'value');
  if (!value.ok) return value;
  return checkHardness({ value: value.value, unit }, 'value', range);
}

/** An optional hardness object; `fallback` when absent. */
export function readOptionalHardness(
  raw: unknown,
  fallback: Hardness | undefined,
  range = HARDNESS_SCALE_RANGE,
): Result<Hardness | undefined> {
  if (raw === undefined || raw === null) return ok(fallback);
  const fields = asFields(raw);
  if (!fields.ok) return fail('hardness.notObject');
  return readHardnessFields(fields.value, range);
}
