/** Recording (or correcting) the lab's result for a job: depth in the user's unit, hardness in HRC or HV. */
import { useState } from 'preact/hooks';
import { HARDNESS_UNITS, type HardnessUnit, type Job, type JobEntry } from '../../jobs';
import { ResultList } from '../ui/ResultList';
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

export function LabEditor({ entry, onDone }: { entry: JobEntry; onDone: (saved: boolean) => void }) {
  const ctx = useScreenContext();
  const { t, units, word, locale } = ctx;
  const id = entry.job.id;
  // The copy the form was opened on; after an update reload, the one its draft started from.
  const [start] = useState(() => readDraft('lab', id, labFormOf(entry.job.lab)));
  const [base, setBase] = useState<{ rev: string; job: Job }>(() =>
    start ? { rev: start.baseRev, job: start.base } : { rev: entry.rev, job: entry.job },
  );
  const [form, setForm] = useState<LabForm>(() => start?.form ?? labFormOf(entry.job.lab));
  const [placed, setPlaced] = useState<PlacedErrors | undefined>(undefined);
  const [stale, setStale] = useState(false);
  const [busy, setBusy] = useState(false);
  const set = (changes: Partial<LabForm>) => {
    const next = { ...form, ...changes };
    setForm(next);
    writeDraft('lab', id, { baseRev: base.rev, base: base.job, form: next });
  };
  const read = readLabForm(form);
  const fieldError = (name: string) => word(read.errors[name]) ?? placed?.fields[name];
  const hardnessChoices = HARDNESS_UNITS.map((u) => ({ value: u, label: UNIT_SYMBOLS[u] ?? u }));

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

  return (
    <form class="card log-form" aria-labelledby="lab-title" onSubmit={(e) => void save(e)} noValidate>
      <h2 id="lab-title">{t('app.log.lab.title')}</h2>
      {stale && entry.job.lab && (
        <ResultList rows={labRows(entry.job.lab, wording)} label={t('app.log.lab.nowInLog')} />
      )}
      <NumberField
        id="lab-ecd"
        label={t('app.log.lab.ecd')}
        unit={units.depth}
        value={form.ecd}
        onInput={(v) => set({ ecd: v })}
        error={fieldError('ecd')}
      />
      <div class="lab-hardness">
        <NumberField
          id="lab-surface-hardness"
          label={t('app.log.lab.surfaceHardness')}
          unitLabel={UNIT_SYMBOLS[form.surfaceUnit]}
          value={form.surfaceHardness}
          onInput={(v) => set({ surfaceHardness: v })}
          error={fieldError('surfaceHardness')}
        />
        <Segmented
          hideLegend
          name="lab-surface-unit"
          legend={t('app.log.lab.surfaceUnit')}
          value={form.surfaceUnit}
          choices={hardnessChoices}
          onChange={(v) => set({ surfaceUnit: v as HardnessUnit })}
        />
      </div>
      <div class="lab-hardness">
        <NumberField
          id="lab-core-hardness"
          label={t('app.log.lab.coreHardness')}
          unitLabel={UNIT_SYMBOLS[form.coreUnit]}
          value={form.coreHardness}
          onInput={(v) => set({ coreHardness: v })}
          error={fieldError('coreHardness')}
        />
        <Segmented
          hideLegend
          name="lab-core-unit"
          legend={t('app.log.lab.coreUnit')}
          value={form.coreUnit}
          choices={hardnessChoices}
          onChange={(v) => set({ coreUnit: v as HardnessUnit })}
        />
      </div>
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
