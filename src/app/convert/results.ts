/** Converts the typed value into every unit of its quantity (hardness marked approximate). */
import { computed } from '@preact/signals';
import { convertRequest, type ConversionResult } from '../../physics';
import { readField } from '../ui/fieldText';
import { formatQuantity, formatScientific } from '../ui/format';
import type { Outcome } from '../ui/outcome';
import { convertForm, quantityOfForm, unitOfForm, type ConvertForm } from './state';

export function computeConversion(form: ConvertForm): Outcome<ConversionResult> {
  const quantity = quantityOfForm(form);
  const from = unitOfForm(form, quantity);
  const value = readField(form.value[quantity], 'value');
  if (!value.ok) return { errors: { value: value.error } };
  const result = convertRequest({ value: value.value, from });
  return result.ok ? { errors: {}, result: result.value } : { errors: { value: result.error } };
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
