/**
 * Recording (or correcting) the lab's result for a job: the traverse first (typed point by point or
 * pasted from the tester), read at the case criterion of the settings; then what the traverse does
 * not give, typed. What is typed is kept across a reload until it is saved or cancelled.
 */
import { useState } from 'preact/hooks';
import { HARDNESS_UNITS, type HardnessUnit, type Job } from '../../jobs';
import { CASE_CRITERIA } from '../../physics';
import { caseCriterion } from '../settings/state';
import type { FieldText } from '../ui/fieldText';
import { UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import { persisted } from '../ui/persist';
import { Segmented } from '../ui/Segmented';
import { TextField } from '../ui/TextField';
import { useScreenContext } from '../settings/screenContext';
import { writeToLog } from './db';
import { FormActions } from './FormActions';
import { placeJobsError, type PlacedErrors } from './jobForm';
import { LAB_FIELDS, labFieldOf, labFormOf, readLabForm, type LabForm } from './labForm';
import { emptyRow, EMPTY_TRAVERSE_FORM } from './traverse/traverseForm';
import { TraverseEditor } from './traverse/TraverseEditor';
import { TraverseFigures } from './traverse/TraverseFigures';

interface LabDraft {
  jobId: string;
  form: LabForm;
}

const EMPTY_DRAFT: LabDraft = {
  jobId: '',
  // One row as the template every stored row is checked against (persist.ts).
  form: {
    ...labFormOf(undefined, new Date(0)),
    traverse: { ...EMPTY_TRAVERSE_FORM, rows: [emptyRow({ text: '', unit: '' })] },
  },
};

/** The lab form being typed, kept across reloads (one job at a time). */
const draft = persisted<LabDraft>('log.labDraft', EMPTY_DRAFT);

const keepDraft = (jobId: string, form: LabForm) => {
  draft.value = { jobId, form };
};
const clearDraft = () => {
  draft.value = EMPTY_DRAFT;
};

/** Whether a lab form for this job was left unsaved (it is resumed as it was typed). */
export const hasLabDraft = (job: Job) => draft.value.jobId === job.id;

export function LabEditor({ job, onDone }: { job: Job; onDone: (saved: boolean) => void }) {
  const { t, units, word, locale } = useScreenContext();
  const [form, setForm] = useState<LabForm>(() =>
    hasLabDraft(job) ? draft.value.form : labFormOf(job.lab, new Date(), units.depth, locale),
  );
  const [placed, setPlaced] = useState<PlacedErrors | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const limit = CASE_CRITERIA[caseCriterion.value];
  const set = (changes: Partial<LabForm>) => {
    const next = { ...form, ...changes };
    setForm(next);
    keepDraft(job.id, next);
  };
  const read = readLabForm(form, limit);
  const fieldError = (name: string) => word(read.errors[name]) ?? placed?.fields[name];
  const finish = (saved: boolean) => {
    clearDraft();
    onDone(saved);
  };

  const save = async (event: Event) => {
    event.preventDefault();
    if (Object.keys(read.errors).length > 0) return;
    setBusy(true);
    const result = await writeToLog((store) => store.update(job.id, { lab: read.lab }));
    setBusy(false);
    if (!result.ok) {
      const labels = (f: string) => ((LAB_FIELDS as readonly string[]).includes(f) ? t(`app.log.lab.${f}`) : undefined);
      const placedError = placeJobsError(t, result.error, labels, labFieldOf);
      // Only the lab result was being written: say that, not that "the job" was lost.
      setPlaced(
        result.error.code === 'record.invalid' ? { ...placedError, general: t('app.log.lab.notSaved') } : placedError,
      );
      return;
    }
    finish(true);
  };

  const { points, analysis } = read.traverse;
  return (
    <form class="card log-form" aria-labelledby="lab-title" onSubmit={(e) => void save(e)} noValidate>
      <h2 id="lab-title">{t('app.log.lab.title')}</h2>
      <TraverseEditor form={form.traverse} onChange={(traverse) => set({ traverse })} outcome={read.traverse} />
      {points && analysis && <TraverseFigures job={job} points={points} analysis={analysis} withRows />}
      {read.typed.ecd && (
        <NumberField
          id="lab-ecd"
          label={t('app.log.lab.ecd')}
          unit={units.depth}
          value={form.ecd}
          hint={analysis ? t('app.log.lab.ecdByHand') : undefined}
          onInput={(v) => set({ ecd: v })}
          error={fieldError('ecd')}
        />
      )}
      {read.typed.surface && (
        <TypedHardness
          id="lab-surface-hardness"
          label={t('app.log.lab.surfaceHardness')}
          legend={t('app.log.lab.surfaceUnit')}
          value={form.surfaceHardness}
          unit={form.surfaceUnit}
          error={fieldError('surfaceHardness')}
          onValue={(surfaceHardness) => set({ surfaceHardness })}
          onUnit={(surfaceUnit) => set({ surfaceUnit })}
        />
      )}
      {read.typed.core && (
        <TypedHardness
          id="lab-core-hardness"
          label={t('app.log.lab.coreHardness')}
          legend={t('app.log.lab.coreUnit')}
          value={form.coreHardness}
          unit={form.coreUnit}
          hint={analysis ? t('app.log.lab.coreByHand') : undefined}
          error={fieldError('coreHardness')}
          onValue={(coreHardness) => set({ coreHardness })}
          onUnit={(coreUnit) => set({ coreUnit })}
        />
      )}
      <NumberField
        id="lab-surface-carbon"
        label={t('app.log.lab.surfaceCarbon')}
        unitLabel={UNIT_SYMBOLS.pctC}
        value={form.surfaceCarbon}
        hint={t('app.log.lab.surfaceCarbonHint')}
        onInput={(v) => set({ surfaceCarbon: v })}
        error={fieldError('surfaceCarbon')}
      />
      <TextField
        id="lab-by"
        label={t('app.log.lab.by')}
        value={form.by}
        onInput={(v) => set({ by: v })}
        error={fieldError('by')}
      />
      <TextField
        id="lab-at"
        type="date"
        label={t('app.log.lab.at')}
        value={form.at}
        onInput={(v) => set({ at: v })}
        error={fieldError('at')}
      />
      <FormActions
        error={placed?.general}
        submitLabel={t('app.log.lab.save')}
        disabled={busy}
        onCancel={() => finish(false)}
      />
    </form>
  );
}

const HARDNESS_CHOICES = HARDNESS_UNITS.map((u) => ({ value: u, label: UNIT_SYMBOLS[u] ?? u }));

/** A hardness typed by hand with its unit beside it (the legend for screen readers; the field names the value). */
function TypedHardness({
  id,
  label,
  legend,
  value,
  unit,
  hint,
  error,
  onValue,
  onUnit,
}: {
  id: string;
  label: string;
  legend: string;
  value: FieldText;
  unit: HardnessUnit;
  hint?: string | undefined;
  error: string | undefined;
  onValue: (value: FieldText) => void;
  onUnit: (unit: HardnessUnit) => void;
}) {
  return (
    <div class="lab-hardness">
      <NumberField
        id={id}
        label={label}
        unitLabel={UNIT_SYMBOLS[unit]}
        value={value}
        hint={hint}
        onInput={onValue}
        error={error}
      />
      <Segmented
        hideLegend
        name={id.replace('-hardness', '-unit')}
        legend={legend}
        value={unit}
        choices={HARDNESS_CHOICES}
        onChange={(v) => onUnit(v as HardnessUnit)}
      />
    </div>
  );
}
