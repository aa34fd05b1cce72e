/** The name of any job field in the user's language, for "changed meanwhile" and "changed on two devices". */
import type { TFunction } from 'i18next';

/** Fields of the job record that have a form label of their own. */
const FORM_LABELS = ['workOrder', 'partNumber', 'furnace', 'operator', 'status', 'notes'];
/** The rest of the record, named under `app.log.fieldNames.`. */
const OTHER_FIELDS = ['steel', 'inputs', 'prediction', 'lab', 'shift', 'shiftDate'];

export function fieldName(t: TFunction, field: string): string {
  if (FORM_LABELS.includes(field)) return t(`app.log.fields.${field}`);
  if (OTHER_FIELDS.includes(field)) return t(`app.log.fieldNames.${field}`);
  return t('app.log.fieldNames.other');
}
