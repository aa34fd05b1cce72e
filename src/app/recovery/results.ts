/** Reads the recovery form (readings in the user's units) and calls equivalentTime (°C, h). */
import { computed } from '@preact/signals';
import { equivalentTime, type DiffusivityModelId, type EquivalentTimeResult } from '../../physics';
import { model } from '../settings/state';
import { readField } from '../ui/fieldText';
import { deferred } from '../ui/Deferred';
import { FieldReader, NO_ERRORS, placeError, type Outcome } from '../ui/outcome';
import { PHYSICS_UNITS } from '../ui/units';
import { recoveryForm, type RecoveryForm } from './state';

export function computeRecovery(form: RecoveryForm, modelId: DiffusivityModelId): Outcome<EquivalentTimeResult> {
  const read = new FieldReader();
  const history = form.readings.map((r, i) => ({
    timeH: read.value(readField(r.time, `history.${i}.timeH`, PHYSICS_UNITS.time)),
    temperatureC: read.value(readField(r.temperature, `history.${i}.temperatureC`, PHYSICS_UNITS.temperature)),
  }));
  const setTemperatureC = read.value(readField(form.setTemperature, 'setTemperatureC', PHYSICS_UNITS.temperature));
  const requiredTimeH = read.value(readField(form.requiredTime, 'requiredTimeH', PHYSICS_UNITS.time));
  if (read.failed) return { errors: read.errors };
  const result = equivalentTime({ history, setTemperatureC, requiredTimeH, model: modelId });
  if (!result.ok) return placeError(result.error, {}, formFields(form));
  return { errors: NO_ERRORS, result: result.value };
}

/** Field names of the form, as physics names them. */
export function formFields(form: RecoveryForm): ReadonlySet<string> {
  return new Set([
    'setTemperatureC',
    'requiredTimeH',
    ...form.readings.flatMap((_, i) => [`history.${i}.timeH`, `history.${i}.temperatureC`]),
  ]);
}

/** The form as the results show it: one task behind the typing (ui/Deferred.tsx). */
export const shownRecoveryForm = deferred(recoveryForm);

export const recoveryOutcome = computed(() => computeRecovery(shownRecoveryForm.value, model.value));
