/** The fields a person types for a job, shared by "save to log" and editing a job. */
import type { TFunction } from 'i18next';
import { JOB_STATUSES, type JobStatus } from '../../jobs';
import { useT } from '../../i18n/useT';
import { Segmented } from '../ui/Segmented';
import { QuickPicks, TextAreaField, TextField } from '../ui/TextField';
import { JOB_FORM_FIELDS, TEXT_MAX, type JobForm } from './jobForm';
import { useLogPicks } from './picks';

export interface JobFieldsProps {
  idPrefix: string;
  form: JobForm;
  onChange: (changes: Partial<JobForm>) => void;
  errors: Partial<Record<string, string>>;
  /** Ask for the steel's name (a custom composition). */
  askGradeName: boolean;
  /** Offer the status choice (an edit changes status on the job page instead). */
  withStatus: boolean;
}

/** The label of a job form field by its name (undefined for names that are not form fields). */
export const jobFieldLabel = (t: TFunction) => (field: string) =>
  (JOB_FORM_FIELDS as readonly string[]).includes(field) ? t(`app.log.fields.${field}`) : undefined;

export function JobFields({ idPrefix, form, onChange, errors, askGradeName, withStatus }: JobFieldsProps) {
  const t = useT();
  const picks = useLogPicks();
  const id = (name: string) => `${idPrefix}-${name}`;
  return (
    <div class="job-fields">
      <div class="field-grid">
        <TextField
          id={id('work-order')}
          label={t('app.log.fields.workOrder')}
          value={form.workOrder}
          maxLength={TEXT_MAX.workOrder}
          autoCapitalize="characters"
          onInput={(v) => onChange({ workOrder: v })}
          error={errors.workOrder}
        />
        <TextField
          id={id('operator')}
          label={t('app.log.fields.operator')}
          value={form.operator}
          maxLength={TEXT_MAX.operator}
          autoCapitalize="characters"
          hint={t('app.log.fields.operatorHint')}
          onInput={(v) => onChange({ operator: v })}
          error={errors.operator}
        />
      </div>
      <TextField
        id={id('part')}
        label={t('app.log.fields.partNumber')}
        value={form.partNumber}
        maxLength={TEXT_MAX.partNumber}
        autoCapitalize="characters"
        onInput={(v) => onChange({ partNumber: v })}
        error={errors.partNumber}
      >
        <QuickPicks
          label={t('app.log.fields.partPicks')}
          values={picks.parts}
          current={form.partNumber}
          onPick={(v) => onChange({ partNumber: v })}
        />
      </TextField>
      <TextField
        id={id('furnace')}
        label={t('app.log.fields.furnace')}
        value={form.furnace}
        maxLength={TEXT_MAX.furnace}
        autoCapitalize="characters"
        onInput={(v) => onChange({ furnace: v })}
        error={errors.furnace}
      >
        <QuickPicks
          label={t('app.log.fields.furnacePicks')}
          values={picks.furnaces}
          current={form.furnace}
          onPick={(v) => onChange({ furnace: v })}
        />
      </TextField>
      {askGradeName && (
        <TextField
          id={id('grade')}
          label={t('app.log.fields.gradeName')}
          value={form.gradeName}
          maxLength={TEXT_MAX.gradeName}
          hint={t('app.log.fields.gradeNameHint')}
          onInput={(v) => onChange({ gradeName: v })}
          error={errors.gradeName}
        />
      )}
      {withStatus && (
        <Segmented
          wrap
          name={id('status')}
          legend={t('app.log.fields.status')}
          value={form.status}
          choices={JOB_STATUSES.map((s) => ({ value: s, label: t(`jobs.status.${s}`) }))}
          onChange={(v) => onChange({ status: v as JobStatus })}
        />
      )}
      <TextAreaField
        id={id('notes')}
        label={t('app.log.fields.notes')}
        value={form.notes}
        maxLength={TEXT_MAX.notes}
        onInput={(v) => onChange({ notes: v })}
        error={errors.notes}
      />
    </div>
  );
}
