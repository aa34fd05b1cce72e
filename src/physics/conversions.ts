/**
 * The `convert` request: one value between units of a quantity, or into every unit
 * of it. Hardness (HRC ↔ HV) is included and always marked approximate.
 */
import { CONVERTIBLE_RANGE, HARDNESS_UNITS, hardnessIn, isHardnessUnit, type HardnessUnit } from './hardness';
import { fail, ok, type Result } from './result';
import { convert, quantityOf, UNITS } from './units';
import { readRequest } from './requestSpec';
import { CONVERT_REQUEST } from './requestTables';

export interface ConversionResult {
  quantity: string;
  value: number;
  from: string;
  /** The value in each requested unit. */
  values: Record<string, number>;
  /** True for hardness: ASTM E140 values from memory; use the standard's tables for acceptance. */
  approximate: boolean;
}

function convertHardness(value: number, from: HardnessUnit, to: HardnessUnit): Result<number> {
  const out = hardnessIn({ value, unit: from }, to);
  return out === undefined
    ? fail('hardness.outOfTable', 'value', { value, unit: from, ...CONVERTIBLE_RANGE[from] })
    : ok(out);
}

/** `convert`: request `{value, from, to?}`; without `to`, into every unit of the quantity. */
export function convertRequest(request: unknown): Result<ConversionResult> {
  const read = readRequest(CONVERT_REQUEST, request);
  if (!read.ok) return read;
  const { value, from, to } = read.value;
  const isHardness = isHardnessUnit(from);
  const quantity = isHardness ? 'hardness' : quantityOf(from);
  if (!quantity) return fail('unit.unknown', 'from', { unit: from });
  const allUnits: readonly string[] = isHardness ? HARDNESS_UNITS : UNITS[quantity as keyof typeof UNITS];
  if (to !== undefined && !allUnits.includes(to)) return fail('unit.unknown', 'to', { unit: to });
  const targets = to === undefined ? allUnits : [to];
  const values: Record<string, number> = {};
  for (const unit of targets) {
    const out = isHardness && isHardnessUnit(unit) ? convertHardness(value, from, unit) : convert(value, from, unit);
    if (!out.ok) return out;
    values[unit] = out.value;
  }
  return ok({ quantity, value, from, values, approximate: isHardness });
}
