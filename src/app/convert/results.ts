/** Converts the typed value into every unit of its quantity (hardness marked approximate), read by the `convert` request's description. */
import { computed } from '@preact/signals';
import { CONVERT_REQUEST, convertRequest, type ConversionResult } from '../../physics';
import { formatQuantity, formatScientific } from '../ui/format';
import { NO_ERRORS, type Outcome } from '../ui/outcome';
import { placeError, readForm, required } from '../ui/readForm';
import { convertForm, quantityOfForm, unitOfForm, type ConvertForm } from './state';

export function computeConversion(form: ConvertForm): Outcome<ConversionResult> {
  const quantity = quantityOfForm(form);
  const read = readForm(CONVERT_REQUEST, { value: required(form.value[quantity]), from: unitOfForm(form, quantity) });
  if (Object.keys(read.errors).length > 0) return { errors: read.errors };
  const result = convertRequest(read.request);
  return result.ok ? { errors: NO_ERRORS, result: result.value } : placeError(result.error, read.fields);
}

export const conversionOutcome = computed(() => computeConversion(convertForm.value));

/** Decimals per unit in the conversion list at most (more than results elsewhere: this is a reference; 1.5 s stays 1.5 s). */
const DIGITS: Record<string, number> = {
  C: 1,
  F: 1,
  K: 2,
  R: 1,
  mm: 4,
  um: 1,
  in: 5,
  thou: 2,
  m: 7,
  h: 4,
  min: 2,
  s: 2,
  HRC: 1,
  HV: 0,
};

export function formatConverted(value: number, unit: string, locale: string): string {
  return unit in DIGITS
    ? formatQuantity(value, unit, locale, DIGITS[unit], true)
    : formatScientific(value, unit, locale, 4);
}
