/** Converts the typed value into every unit of its quantity (hardness marked approximate), read by the `convert` request's description. */
import { computed } from '@preact/signals';
import { CONVERT_REQUEST, convertRequest, type ConversionResult } from '../../physics';
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
