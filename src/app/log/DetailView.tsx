/** One job: what was logged, its status (changed with one tap), an edit form, the plan and prediction, the lab's result. */
import { useState } from 'preact/hooks';
import {
  analyseStoredTraverse,
  describeJobsError,
  JOB_STATUSES,
  type Job,
  type JobStatus,
  type StoredTraverse,
} from '../../jobs';
import { ErrorNote } from '../ui/Notices';
import { ResultList, type ResultRow } from '../ui/ResultList';
import { Segmented } from '../ui/Segmented';
import { useScreenContext } from '../settings/screenContext';
import { hrefFor } from '../shell/route';
import { writeToLog } from './db';
import { formatCalendarDate, formatMoment } from './dates';
import { DamagedRecords } from './DamagedRecords';
import { FormActions } from './FormActions';
import { JobFields, jobFieldLabel } from './JobFields';
import {
  changesOf,
  formOfJob,
  missingFields,
  placeJobsError,
  placeMissing,
  type JobForm,
  type PlacedErrors,
} from './jobForm';
import { comparisonRows, labRows, planRows, predictionRows } from './jobRows';
import { hasLabDraft, LabEditor } from './LabEditor';
import { TraverseFigures } from './traverse/TraverseFigures';
import { useJob } from './useLog';

type Mode = 'view' | 'edit' | 'lab';

export function DetailView({ id }: { id: string }) {
  const { t, locale } = useScreenContext();
  const loaded = useJob(id);
  const back = (
    <a class="back-link" href={hrefFor('log')}>
      {t('app.log.detail.back')}
    </a>
  );
  if (loaded.state === 'loading') return <p class="screen-loading">{t('app.shell.loading')}</p>;
  if (loaded.state === 'failed') {
    return (
      <>
        {back}
        <h1 tabIndex={-1}>{t('app.log.detail.missingTitle')}</h1>
        {loaded.error.code === 'record.invalid' ? (
          <DamagedRecords records={[{ key: id, issues: loaded.error.issues ?? [] }]} />
        ) : (
          <ErrorNote message={describeJobsError(t, loaded.error)} />
        )}
      </>
    );
  }
  const job = loaded.value;
  return (
    <>
      {back}
      <JobPage key={job.id} job={job} locale={locale} />
    </>
  );
}

function JobPage({ job, locale }: { job: Job; locale: string }) {
  const ctx = useScreenContext();
  const { t } = ctx;
  // A lab form left unsaved (a reload, an update) opens again as it was typed.
  const [mode, setMode] = useState<Mode>(() => (hasLabDraft(job) ? 'lab' : 'view'));
  const [message, setMessage] = useState<string | undefined>(undefined);
  const [error, setError] = useState<string | undefined>(undefined);
  const wording = { t, show: ctx.show, locale };
  const title = job.workOrder
    ? t('app.log.detail.title', { workOrder: job.workOrder })
    : t('app.log.detail.titleNoOrder', { part: job.partNumber });

  const setStatus = async (status: JobStatus) => {
    setMessage(undefined);
    const result = await writeToLog((store) => store.update(job.id, { status }));
    if (result.ok) setMessage(t('app.log.detail.statusSaved', { status: t(`jobs.status.${status}`) }));
    else setError(describeJobsError(t, result.error));
  };
  const finish = (saved: boolean, text: string) => {
    setMode('view');
    if (saved) setMessage(text);
  };

  const loadRows: ResultRow[] = [
    { key: 'part', label: t('app.log.fields.partNumber'), value: job.partNumber, text: true },
    { key: 'furnace', label: t('app.log.fields.furnace'), value: job.furnace, text: true },
    { key: 'operator', label: t('app.log.fields.operator'), value: job.operator, text: true },
    {
      key: 'shift',
      label: t('app.log.detail.shift'),
      value: t(`jobs.shift.${job.shift}`),
      detail: formatCalendarDate(job.shiftDate, locale),
      text: true,
    },
    {
      key: 'created',
      label: t('app.log.detail.created'),
      value: formatMoment(job.createdAt, locale),
      text: true,
      detail:
        job.updatedAt !== job.createdAt
          ? t('app.log.detail.updated', { when: formatMoment(job.updatedAt, locale) })
          : undefined,
    },
  ];

  return (
    <>
      <h1 tabIndex={-1}>{title}</h1>
      <p class="log-subtitle">
        {t(`jobs.status.${job.status}`)} · {job.partNumber} · {job.furnace} · {t(`jobs.shift.${job.shift}`)}
      </p>
      <div aria-live="polite">{message && <p class="log-saved">{message}</p>}</div>
      <ErrorNote message={error} />

      <div class="card">
        <Segmented
          wrap
          name="job-status"
          legend={t('app.log.fields.status')}
          value={job.status}
          choices={JOB_STATUSES.map((s) => ({ value: s, label: t(`jobs.status.${s}`) }))}
          onChange={(s) => void setStatus(s as JobStatus)}
        />
      </div>

      {mode === 'edit' ? (
        <JobEditor job={job} onDone={(saved) => finish(saved, t('app.log.detail.edited'))} />
      ) : (
        <section class="card" aria-labelledby="job-load">
          <h2 id="job-load">{t('app.log.detail.load')}</h2>
          <ResultList rows={loadRows} label={t('app.log.detail.load')} />
          <div class="job-notes">
            <h3>{t('app.log.fields.notes')}</h3>
            {job.notes ? <p class="job-notes-text">{job.notes}</p> : <p class="note">{t('app.log.detail.noNotes')}</p>}
          </div>
          <button type="button" class="button" onClick={() => setMode('edit')}>
            {t('app.log.detail.edit')}
          </button>
        </section>
      )}

      {mode === 'lab' ? (
        <LabEditor job={job} onDone={(saved) => finish(saved, t('app.log.lab.saved'))} />
      ) : (
        <section class="card" aria-labelledby="job-lab">
          <h2 id="job-lab">{t('app.log.lab.heading')}</h2>
          {job.lab ? (
            <ResultList
              rows={[...labRows(job.lab, wording), ...comparisonRows(job, wording)]}
              label={t('app.log.lab.heading')}
            />
          ) : (
            <p class="note">{t('app.log.lab.none')}</p>
          )}
          {job.lab?.traverse && <LabTraverse job={job} traverse={job.lab.traverse} />}
          <button type="button" class="button button-primary" onClick={() => setMode('lab')}>
            {job.lab ? t('app.log.lab.change') : t('app.log.lab.record')}
          </button>
        </section>
      )}

      <section class="card" aria-labelledby="job-plan">
        <h2 id="job-plan">{t('app.log.detail.plan')}</h2>
        {job.prediction ? (
          <ResultList
            rows={predictionRows(job.prediction, job.inputs?.kind, wording)}
            label={t('app.log.detail.plan')}
          />
        ) : (
          <p class="note">{t('app.log.detail.noPrediction')}</p>
        )}
        <h3 class="card-subheading">{t('app.common.inputs')}</h3>
        <ResultList rows={planRows(job.steel, job.inputs, wording)} label={t('app.common.inputs')} />
        <p class="note">{t('app.common.estimateNote')}</p>
      </section>
    </>
  );
}

function JobEditor({ job, onDone }: { job: Job; onDone: (saved: boolean) => void }) {
  const { t } = useScreenContext();
  const [form, setForm] = useState<JobForm>(() => formOfJob(job));
  const [placed, setPlaced] = useState<PlacedErrors | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const save = async (event: Event) => {
    event.preventDefault();
    const missing = missingFields(form, true);
    if (missing.length > 0) {
      setPlaced(placeMissing(t, missing));
      return;
    }
    setBusy(true);
    const result = await writeToLog((store) => store.update(job.id, changesOf(job, form)));
    setBusy(false);
    if (!result.ok) {
      setPlaced(placeJobsError(t, result.error, jobFieldLabel(t)));
      return;
    }
    onDone(true);
  };
  return (
    <form class="card log-form" aria-labelledby="job-edit" onSubmit={(e) => void save(e)} noValidate>
      <h2 id="job-edit">{t('app.log.detail.editTitle')}</h2>
      <JobFields
        idPrefix="job-edit"
        form={form}
        onChange={(changes) => setForm({ ...form, ...changes })}
        errors={placed?.fields ?? {}}
        askGradeName
        withStatus={false}
      />
      <FormActions
        error={placed?.general}
        submitLabel={t('app.log.detail.saveEdit')}
        disabled={busy}
        onCancel={() => onDone(false)}
      />
    </form>
  );
}

/** The stored traverse over the prediction (the figures are in the rows above). */
function LabTraverse({ job, traverse }: { job: Job; traverse: StoredTraverse }) {
  const analysis = analyseStoredTraverse(traverse);
  if (!analysis) return null;
  return <TraverseFigures job={job} points={traverse.points} analysis={analysis} withRows={false} />;
}
