/** One job: what was logged, its status (changed with one tap), an edit form, the plan and prediction, the lab's result. */
import { useState } from 'preact/hooks';
import {
  analyseStoredTraverse,
  describeJobsError,
  JOB_STATUSES,
  type Job,
  type JobEntry,
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
  EMPTY_JOB_FORM,
  formOfJob,
  rebasedForm,
  missingFields,
  placeJobsError,
  placeMissing,
  type JobForm,
  type PlacedErrors,
} from './jobForm';
import { comparisonRows, labRows, planRows, predictionRows } from './jobRows';
import { LabEditor } from './LabEditor';
import { TraverseFigures } from './traverse/TraverseFigures';
import { clearDraft, hasDraft, readDraft, writeDraft } from './drafts';
import { staleSentence } from './refusal';
import { OpenChoices } from './OpenChoices';
import { useJobEntry } from './useLog';
import { hasRole } from '../sync/session';
import { shopConfigured } from '../sync/state';
import { SUPERVISOR_STATUSES } from '../../jobs/designDoc';

/**
 * Whether the signed-in person may move a job from one status to another, as the server's rules
 * say (shown before they try; on a device without a server every change is allowed).
 */
function statusAllowed(from: JobStatus, to: JobStatus): boolean {
  if (from === to || !shopConfigured() || hasRole('supervisor')) return true;
  const held = SUPERVISOR_STATUSES as readonly string[];
  return !held.includes(from) && !held.includes(to);
}

type Mode = 'view' | 'edit' | 'lab';

export function DetailView({ id }: { id: string }) {
  const { t, locale } = useScreenContext();
  const loaded = useJobEntry(id);
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
  return (
    <>
      {back}
      <JobPage key={id} entry={loaded.value} locale={locale} />
    </>
  );
}

/** The form this tab left open on the job (kept across an update reload), else none. */
function draftMode(jobId: string): Mode {
  if (hasDraft('edit', jobId)) return 'edit';
  if (hasDraft('lab', jobId)) return 'lab';
  return 'view';
}

function JobPage({ entry, locale }: { entry: JobEntry; locale: string }) {
  const ctx = useScreenContext();
  const { t } = ctx;
  const job = entry.job;
  const [mode, setMode] = useState<Mode>(() => draftMode(job.id));
  const [message, setMessage] = useState<string | undefined>(undefined);
  const [error, setError] = useState<string | undefined>(undefined);
  const wording = { t, show: ctx.show, locale };
  const title = job.workOrder
    ? t('app.log.detail.title', { workOrder: job.workOrder })
    : t('app.log.detail.titleNoOrder', { part: job.partNumber });

  const setStatus = async (status: JobStatus) => {
    setMessage(undefined);
    setError(undefined);
    // The tap was made on what this page shows: if the job moved on meanwhile, it is not applied blind.
    const result = await writeToLog((store) => store.update(job.id, { status }, { baseRev: entry.rev }));
    if (result.ok) setMessage(t('app.log.detail.statusSaved', { status: t(`jobs.status.${status}`) }));
    else setError(staleSentence(t, result.error));
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
      <OpenChoices entry={entry} onSaved={setMessage} />

      <div class="card">
        <Segmented
          wrap
          name="job-status"
          legend={t('app.log.fields.status')}
          value={job.status}
          choices={JOB_STATUSES.map((s) => ({
            value: s,
            label: t(`jobs.status.${s}`),
            disabled: !statusAllowed(job.status, s),
          }))}
          onChange={(s) => void setStatus(s as JobStatus)}
        />
        {shopConfigured() && !hasRole('supervisor') && <p class="note">{t('app.shop.notSupervisor')}</p>}
      </div>

      {mode === 'edit' ? (
        <JobEditor entry={entry} onDone={(saved) => finish(saved, t('app.log.detail.edited'))} />
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
        <LabEditor entry={entry} onDone={(saved) => finish(saved, t('app.log.lab.saved'))} />
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

function JobEditor({ entry, onDone }: { entry: JobEntry; onDone: (saved: boolean) => void }) {
  const { t } = useScreenContext();
  const id = entry.job.id;
  // The copy the form was opened on (or, after a reload, the one its draft started from).
  const [start] = useState(() => readDraft('edit', id, EMPTY_JOB_FORM));
  const [base, setBase] = useState<{ rev: string; job: Job }>(() =>
    start ? { rev: start.baseRev, job: start.base } : { rev: entry.rev, job: entry.job },
  );
  const [form, setFormState] = useState<JobForm>(() => (start ? start.form : formOfJob(entry.job)));
  const [placed, setPlaced] = useState<PlacedErrors | undefined>(undefined);
  const [stale, setStale] = useState(false);
  const [busy, setBusy] = useState(false);
  // Only a steel of the calculator's own composition needs naming; a listed grade has its name.
  const askGradeName = entry.job.steel.gradeId === undefined;
  const setForm = (next: JobForm, from = base) => {
    setFormState(next);
    writeDraft('edit', id, { baseRev: from.rev, base: from.job, form: next });
  };
  const save = async (event: Event) => {
    event.preventDefault();
    const missing = missingFields(form, askGradeName);
    if (missing.length > 0) {
      setPlaced(placeMissing(t, missing));
      return;
    }
    setBusy(true);
    const result = await writeToLog((store) => store.update(id, changesOf(base.job, form), { baseRev: base.rev }));
    setBusy(false);
    if (!result.ok) {
      const where = placeJobsError(t, result.error, jobFieldLabel(t));
      setStale(result.error.code === 'record.stale');
      setPlaced(result.error.code === 'record.stale' ? { ...where, general: staleSentence(t, result.error) } : where);
      return;
    }
    clearDraft('edit', id);
    onDone(true);
  };
  const rebase = () => {
    const current = { rev: entry.rev, job: entry.job };
    setBase(current);
    setForm(rebasedForm(base.job, form, entry.job), current);
    setStale(false);
    setPlaced(undefined);
  };
  const cancel = () => {
    clearDraft('edit', id);
    onDone(false);
  };
  return (
    <form class="card log-form" aria-labelledby="job-edit" onSubmit={(e) => void save(e)} noValidate>
      <h2 id="job-edit">{t('app.log.detail.editTitle')}</h2>
      <JobFields
        idPrefix="job-edit"
        form={form}
        onChange={(changes) => setForm({ ...form, ...changes })}
        errors={placed?.fields ?? {}}
        askGradeName={askGradeName}
        withStatus={false}
      />
      <FormActions
        error={placed?.general}
        submitLabel={t('app.log.detail.saveEdit')}
        disabled={busy}
        onCancel={cancel}
      />
      {stale && entry.rev !== base.rev && (
        <button type="button" class="button button-wide" onClick={rebase}>
          {t('app.log.detail.staleAgain')}
        </button>
      )}
    </form>
  );
}

/** The stored traverse over the prediction (the figures are in the rows above). */
function LabTraverse({ job, traverse }: { job: Job; traverse: StoredTraverse }) {
  const analysis = analyseStoredTraverse(traverse);
  if (!analysis) return null;
  return <TraverseFigures job={job} points={traverse.points} analysis={analysis} withRows={false} />;
}
