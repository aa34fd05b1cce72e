/** The upset-recovery form: what the furnace actually did, and what the recipe asks for. */
import { field, type FieldText } from '../ui/fieldText';
import { persisted } from '../ui/persist';

export interface Reading {
  time: FieldText;
  temperature: FieldText;
}

export interface RecoveryForm {
  readings: Reading[];
  setTemperature: FieldText;
  requiredTime: FieldText;
}

/** The furnace sat 40 min at 890 °C: how much longer at 925 °C for a 4 h soak? */
export const DEFAULT_RECOVERY_FORM: RecoveryForm = {
  readings: [
    { time: field('0', 'min'), temperature: field('890', 'C') },
    { time: field('40', 'min'), temperature: field('890', 'C') },
  ],
  setTemperature: field('925', 'C'),
  requiredTime: field('4', 'h'),
};

export const recoveryForm = persisted<RecoveryForm>('form.recovery', DEFAULT_RECOVERY_FORM);

export const MAX_READINGS = 48;

export function addReading(form: RecoveryForm): RecoveryForm {
  if (form.readings.length >= MAX_READINGS) return form;
  const last = form.readings[form.readings.length - 1];
  const next: Reading = last
    ? { time: { ...last.time, text: '' }, temperature: { ...last.temperature } }
    : { time: field('0', 'h'), temperature: field('', 'C') };
  return { ...form, readings: [...form.readings, next] };
}

export function removeReading(form: RecoveryForm, index: number): RecoveryForm {
  return { ...form, readings: form.readings.filter((_, i) => i !== index) };
}

export function setReading(form: RecoveryForm, index: number, changes: Partial<Reading>): RecoveryForm {
  return { ...form, readings: form.readings.map((r, i) => (i === index ? { ...r, ...changes } : r)) };
}
