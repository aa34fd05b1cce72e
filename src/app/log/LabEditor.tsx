/**
 * Recording (or correcting) the lab's result for a job: the traverse first (typed point by point or
 * pasted from the tester), read at the case criterion of the settings; then what the traverse does
 * not give, typed. What is typed is kept per tab across a reload until it is saved or cancelled.
 */
import { useState } from 'preact/hooks';
import { HARDNESS_UNITS, type HardnessUnit, type Job, type JobEntry } from '../../jobs';
import { CASE_CRITERIA } from '../../physics';
import { caseCriterion } from '../settings/state';
import { ResultList } from '../ui/ResultList';
import type { FieldText } from '../ui/fieldText';
import { UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import { Segmented } from '../ui/Segmented';
import { TextField } from '../ui/TextField';
import { useScreenContext } from '../settings/screenContext';
import { writeToLog } from './db';
import { staleSentence } from './refusal';
import { clearDraft, readDraft, writeDraft } from './drafts';
import { labRows } from './jobRows';
import { FormActions } from './FormActions';
import { placeJobsError, type PlacedErrors } from './jobForm';
import { LAB_FIELDS, labFieldOf, labFormOf, readLabForm, type LabForm } from './labForm';
import { emptyRow } from './traverse/traverseForm';
import { TraverseEditor } from './traverse/TraverseEditor';
import { TraverseFigures } from './traverse/TraverseFigures';

/** A form to check a stored draft against: one traverse row, the template every stored row is merged over (persist.ts). */
const draftTemplate = (form: LabForm): LabForm => ({
  ...form,
  traverse: { ...form.traverse, rows: [emptyRow({ text: '', unit: '' })] },
});

export function LabEditor({ entry, onDone }: { entry: JobEntry; onDone: (saved: boolean) => void }) {
  const ctx = useScreenContext();
  const { t, units, word, locale } = ctx;
  const id = entry.job.id;
  const opened = () => labFormOf(entry.job.lab, new Date(), units.depth, locale);
  // The copy the form was opened on; after an update reload, the one its draft started from.
  const [start] = useState(() => readDraft('lab', id, draftTemplate(opened())));
  const [base, setBase] = useState<{ rev: string; job: Job }>(() =>
    start ? { rev: start.baseRev, job: start.base } : { rev: entry.rev, job: entry.job },
  );
  const [form, setForm] = useState<LabForm>(() => start?.form ?? opened());
  const [placed, setPlaced] = useState<PlacedErrors | undefined>(undefined);
  const [stale, setStale] = useState(false);
  const [busy, setBusy] = useState(false);
  const limit = CASE_CRITERIA[caseCriterion.value];
  const set = (changes: Partial<LabForm>) => {
    const next = { ...form, ...changes };
    setForm(next);
    writeDraft('lab', id, { baseRev: base.rev, base: base.job, form: next });
  };
  const read = readLabForm(form, limit);
  const fieldError = (name: string) => word(read.errors[name]) ?? placed?.fields[name];

  const save = async (event: Event) => {
    event.preventDefault();
    if (Object.keys(read.errors).length > 0) return;
    setBusy(true);
    const result = await writeToLog((store) => store.update(id, { lab: read.lab }, { baseRev: base.rev }));
    setBusy(false);
    if (!result.ok) {
      const labels = (f: string) => ((LAB_FIELDS as readonly string[]).includes(f) ? t(`app.log.lab.${f}`) : undefined);
      const where = placeJobsError(t, result.error, labels, labFieldOf);
      setStale(result.error.code === 'record.stale');
      setPlaced(
        result.error.code === 'record.stale'
          ? { fields: {}, general: staleSentence(t, result.error) }
          : // Only the lab result was being written: say that, not that "the job" was lost.
            result.error.code === 'record.invalid'
            ? { ...where, general: t('app.log.lab.notSaved') }
            : where,
      );
      return;
    }
    clearDraft('lab', id);
    onDone(true);
  };
  // The lab result is one field: moving onto the newer copy keeps everything typed here.
  const rebase = () => {
    const current = { rev: entry.rev, job: entry.job };
    setBase(current);
    writeDraft('lab', id, { baseRev: current.rev, base: current.job, form });
    setStale(false);
    setPlaced(undefined);
  };
  const cancel = () => {
    clearDraft('lab', id);
    onDone(false);
  };
  const wording = { t, show: ctx.show, locale };
  const { points, analysis } = read.traverse;

  return (
    <form class="card log-form" aria-labelledby="lab-title" onSubmit={(e) => void save(e)} noValidate>
      <h2 id="lab-title">{t('app.log.lab.title')}</h2>
      {stale && entry.job.lab && (
        <ResultList rows={labRows(entry.job.lab, wording)} label={t('app.log.lab.nowInLog')} />
      )}
      <TraverseEditor form={form.traverse} onChange={(traverse) => set({ traverse })} outcome={read.traverse} />
      {points && analysis && <TraverseFigures job={entry.job} points={points} analysis={analysis} withRows />}
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
      <FormActions error={placed?.general} submitLabel={t('app.log.lab.save')} disabled={busy} onCancel={cancel} />
      {stale && entry.rev !== base.rev && (
        <button type="button" class="button button-wide" onClick={rebase}>
          {t('app.log.detail.staleAgain')}
        </button>
      )}
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
