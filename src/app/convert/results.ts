/** Converts the typed value into every unit of its quantity (hardness marked approximate). */
import { computed } from '@preact/signals';
import { convertRequest, type ConversionResult } from '../../physics';
import { readField } from '../ui/fieldText';
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
