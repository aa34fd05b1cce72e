/** Recording (or correcting) the lab's result for a job: depth in the user's unit, hardness in HRC or HV. */
import { useState } from 'preact/hooks';
import { HARDNESS_UNITS, type HardnessUnit, type Job } from '../../jobs';
import { UNIT_SYMBOLS } from '../ui/format';
import { NumberField } from '../ui/NumberField';
import { Segmented } from '../ui/Segmented';
import { TextField } from '../ui/TextField';
import { useScreenContext } from '../settings/screenContext';
import { writeToLog } from './db';
import { FormActions } from './FormActions';
import { placeJobsError, type PlacedErrors } from './jobForm';
import { LAB_FIELDS, labFieldOf, labFormOf, readLabForm, type LabForm } from './labForm';

export function LabEditor({ job, onDone }: { job: Job; onDone: (saved: boolean) => void }) {
  const { t, units, word } = useScreenContext();
  const [form, setForm] = useState<LabForm>(() => labFormOf(job.lab));
  const [placed, setPlaced] = useState<PlacedErrors | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const set = (changes: Partial<LabForm>) => setForm({ ...form, ...changes });
  const read = readLabForm(form);
  const fieldError = (name: string) => word(read.errors[name]) ?? placed?.fields[name];
  const hardnessChoices = HARDNESS_UNITS.map((u) => ({ value: u, label: UNIT_SYMBOLS[u] ?? u }));

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
    onDone(true);
  };

  return (
    <form class="card log-form" aria-labelledby="lab-title" onSubmit={(e) => void save(e)} noValidate>
      <h2 id="lab-title">{t('app.log.lab.title')}</h2>
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
      <FormActions
        error={placed?.general}
        submitLabel={t('app.log.lab.save')}
        disabled={busy}
        onCancel={() => onDone(false)}
      />
    </form>
  );
}
