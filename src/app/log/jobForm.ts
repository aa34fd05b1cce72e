/**
 * The fields a person types for a job (the calculator knows the rest): reading them into a
 * draft or into the changes of an edit, and placing the store's validation problems beside
 * the fields they belong to.
 */
import type { TFunction } from 'i18next';
import {
  describeJobsError,
  problemMessageKey,
  TEXT_LIMITS,
  type Job,
  type JobChanges,
  type JobsError,
  type JobStatus,
} from '../../jobs';
import type { LogEntry } from './entry';
import { FURNACE_NAME_MAX } from '../../jobs/limits';

export interface JobForm {
  workOrder: string;
  partNumber: string;
  furnace: string;
  operator: string;
  status: JobStatus;
  notes: string;
  /** Asked only when the calculator had a custom composition. */
  gradeName: string;
}

export const EMPTY_JOB_FORM: JobForm = {
  workOrder: '',
  partNumber: '',
  furnace: '',
  operator: '',
  status: 'planned',
  notes: '',
  gradeName: '',
};

export const JOB_FORM_FIELDS = [
  'workOrder',
  'partNumber',
  'furnace',
  'operator',
  'status',
  'notes',
  'gradeName',
] as const;
export type JobFormField = (typeof JOB_FORM_FIELDS)[number];

export const TEXT_MAX: Record<JobFormField, number> = {
  workOrder: TEXT_LIMITS.short,
  partNumber: TEXT_LIMITS.short,
  furnace: FURNACE_NAME_MAX,
  operator: 4,
  status: TEXT_LIMITS.short,
  notes: TEXT_LIMITS.notes,
  gradeName: TEXT_LIMITS.short,
};

/** The new job: the calculator's entry and what the person typed (the store adds id, times and shift). */
export function draftOf(form: JobForm, entry: LogEntry): Record<string, unknown> {
  return {
    workOrder: form.workOrder,
    partNumber: form.partNumber,
    furnace: form.furnace,
    operator: form.operator,
    status: form.status,
    notes: form.notes,
    steel: { ...entry.steel, gradeName: entry.steel.gradeName ?? form.gradeName.trim() },
    inputs: entry.inputs,
    prediction: entry.prediction,
  };
}

export function formOfJob(job: Job): JobForm {
  return {
    workOrder: job.workOrder,
    partNumber: job.partNumber,
    furnace: job.furnace,
    operator: job.operator,
    status: job.status,
    notes: job.notes,
    gradeName: job.steel.gradeName,
  };
}

/**
 * Only the fields the person changed from `job`, the copy the form was opened on (never a newer one
 * read meanwhile: comparing with that would write the form's old values back over it).
 */
export function changesOf(job: Job, form: JobForm): JobChanges {
  const before = formOfJob(job);
  const changes: Record<string, unknown> = {};
  for (const field of ['workOrder', 'partNumber', 'furnace', 'operator', 'status', 'notes'] as const) {
    if (form[field] !== before[field]) changes[field] = form[field];
  }
  if (form.gradeName !== before.gradeName) changes.steel = { ...job.steel, gradeName: form.gradeName.trim() };
  return changes;
}

/** The form field a problem's path belongs to (`steel.gradeName` → gradeName, `lab.ecdMm` → lab). */
export function jobFieldOf(path: string): string {
  return path === 'steel.gradeName' ? 'gradeName' : path.split(/[.[]/u)[0]!;
}

export interface PlacedErrors {
  /** Worded problems by form field. */
  fields: Partial<Record<string, string>>;
  /** The whole sentence, for the top of the form. */
  general: string;
}

/** Fields the log requires that are still empty (checked before the store, for a plain "required"). */
export function missingFields(form: JobForm, askGradeName: boolean): JobFormField[] {
  const required: JobFormField[] = [
    'partNumber',
    'furnace',
    'operator',
    ...(askGradeName ? (['gradeName'] as const) : []),
  ];
  return required.filter((field) => form[field].trim() === '');
}

/** The "required" errors for `missing`, in the shape of a placed store error. */
export function placeMissing(t: TFunction, missing: readonly JobFormField[]): PlacedErrors {
  return {
    fields: Object.fromEntries(missing.map((field) => [field, t('app.log.fields.required')])),
    general: t('jobs.errors.record.invalid'),
  };
}

/**
 * The store's error worded for a form: each validation problem beside its field (its path's
 * first part, mapped through `fieldOf`), named by the field's label (format examples are the
 * fields' own hints).
 */
export function placeJobsError(
  t: TFunction,
  error: JobsError,
  labelOf: (field: string) => string | undefined,
  fieldOf: (path: string) => string = jobFieldOf,
): PlacedErrors {
  const fields: Partial<Record<string, string>> = {};
  for (const issue of error.issues ?? []) {
    const field = fieldOf(issue.path);
    const label = labelOf(field);
    if (!label || fields[field]) continue;
    const { key, params } = problemMessageKey(issue);
    fields[field] = t(key, { ...params, path: label });
  }
  const placedAll = (error.issues ?? []).every((issue) => labelOf(fieldOf(issue.path)) !== undefined);
  return {
    fields,
    general:
      placedAll && error.issues?.length
        ? t(`jobs.errors.${error.code}`, error.params ?? {})
        : describeJobsError(t, error),
  };
}

/**
 * The form moved onto a newer copy of the job: what the person changed from the old copy stays,
 * every other field shows the newer copy's value.
 */
export function rebasedForm(oldBase: Job, form: JobForm, current: Job): JobForm {
  const before = formOfJob(oldBase);
  const next = formOfJob(current);
  for (const field of JOB_FORM_FIELDS) {
    if (form[field] !== before[field]) (next as unknown as Record<string, string>)[field] = form[field];
  }
  return next;
}
