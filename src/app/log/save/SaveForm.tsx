/** The "save to log" form: what the calculator records, and the few fields only the person knows. */
import { useEffect, useRef, useState } from 'preact/hooks';
import { persisted, patch } from '../../ui/persist';
import { ResultList } from '../../ui/ResultList';
import { useScreenContext } from '../../settings/screenContext';
import { askPersistenceOnce, writeToLog } from '../db';
import { formatCalendarDate } from '../dates';
import type { LogEntry } from '../entry';
import { FormActions } from '../FormActions';
import { JobFields, jobFieldLabel } from '../JobFields';
import {
  draftOf,
  EMPTY_JOB_FORM,
  missingFields,
  placeJobsError,
  placeMissing,
  type JobForm,
  type PlacedErrors,
} from '../jobForm';
import { planRows, predictionRows } from '../jobRows';
import { shiftConfig } from '../shifts';
import type { PanelProps } from './LogActions';
import '../log.css';

/** What is being typed, kept across reloads; operator and furnace stay for the next load. */
const draft = persisted<JobForm>('log.draft', EMPTY_JOB_FORM);

export default function SaveForm({ value: entry, onDone }: PanelProps<LogEntry>) {
  const ctx = useScreenContext();
  const { t, locale } = ctx;
  const form = draft.value;
  const [placed, setPlaced] = useState<PlacedErrors | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const title = useRef<HTMLHeadingElement>(null);
  const calculatorFurnace = entry?.furnace;
  useEffect(() => {
    // The furnace chosen in the calculator is the one this load runs in.
    if (calculatorFurnace) patch(draft, { furnace: calculatorFurnace });
  }, [calculatorFurnace]);
  useEffect(() => title.current?.focus(), []);
  if (!entry) return null;
  const wording = { t, show: ctx.show, locale };

  const askGradeName = entry.steel.gradeName === undefined;
  const save = async (event: Event) => {
    event.preventDefault();
    const missing = missingFields(form, askGradeName);
    if (missing.length > 0) {
      setPlaced(placeMissing(t, missing));
      return;
    }
    setBusy(true);
    const result = await writeToLog((store) => store.add(draftOf(form, entry), { shiftConfig: shiftConfig.value }));
    setBusy(false);
    if (!result.ok) {
      setPlaced(placeJobsError(t, result.error, jobFieldLabel(t)));
      return;
    }
    void askPersistenceOnce();
    draft.value = { ...EMPTY_JOB_FORM, operator: form.operator, furnace: form.furnace };
    const job = result.value;
    onDone({
      jobId: job.id,
      message: t('app.log.save.saved', {
        shift: t(`jobs.shift.${job.shift}`),
        date: formatCalendarDate(job.shiftDate, locale),
      }),
    });
  };

  return (
    <form class="card log-form" aria-labelledby="log-save-title" onSubmit={(e) => void save(e)} noValidate>
      <h2 id="log-save-title" ref={title} tabIndex={-1}>
        {t('app.log.save.title')}
      </h2>
      <ResultList
        rows={predictionRows(entry.prediction, entry.inputs.kind, wording).slice(0, 2)}
        label={t('app.log.save.recorded')}
      />
      <details class="disclosure">
        <summary>{t('app.log.save.recorded')}</summary>
        <ResultList
          rows={[
            ...planRows(entry.steel, entry.inputs, wording),
            ...predictionRows(entry.prediction, entry.inputs.kind, wording).slice(2),
          ]}
          label={t('app.log.save.recorded')}
        />
      </details>
      <JobFields
        idPrefix="log-save"
        form={form}
        onChange={(changes) => patch(draft, changes)}
        errors={placed?.fields ?? {}}
        askGradeName={askGradeName}
        withStatus
      />
      <FormActions
        error={placed?.general}
        submitLabel={t('app.log.save.submit')}
        disabled={busy}
        onCancel={() => onDone(undefined)}
      />
    </form>
  );
}
