/** Reads the recovery form (readings in the user's units) by the `equivalent-time` request's description and calls equivalentTime (°C, h). */
import { computed } from '@preact/signals';
import {
  EQUIVALENT_TIME_REQUEST,
  equivalentTime,
  type DiffusivityModelId,
  type EquivalentTimeResult,
} from '../../physics';
import { model } from '../settings/state';
import { deferred } from '../ui/Deferred';
import { NO_ERRORS, type Outcome } from '../ui/outcome';
import { placeError, readForm, required } from '../ui/readForm';
import { recoveryForm, type RecoveryForm } from './state';

export function computeRecovery(form: RecoveryForm, modelId: DiffusivityModelId): Outcome<EquivalentTimeResult> {
  const read = readForm(EQUIVALENT_TIME_REQUEST, {
    history: form.readings.map((r) => ({ timeH: r.time, temperatureC: r.temperature })),
    setTemperatureC: form.setTemperature,
    // The answer is the time still to go: without the soak asked for there is none.
    requiredTimeH: required(form.requiredTime),
    model: modelId,
  });
  if (Object.keys(read.errors).length > 0) return { errors: read.errors };
  const result = equivalentTime(read.request);
  return result.ok ? { errors: NO_ERRORS, result: result.value } : placeError(result.error, read.fields);
}

/** The form as the results show it: one task behind the typing (ui/Deferred.tsx). */
export const shownRecoveryForm = deferred(recoveryForm);

export const recoveryOutcome = computed(() => computeRecovery(shownRecoveryForm.value, model.value));
