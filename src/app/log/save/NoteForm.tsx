/** Adds a calculator's line (an upset and its recovery) to the notes of a job still open on this or the last shift. */
import { useEffect, useRef, useState } from 'preact/hooks';
import { addDays, describeJobsError, OPEN_STATUSES, type Job } from '../../../jobs';
import { ChoiceField } from '../../ui/ChoiceField';
import { useScreenContext } from '../../settings/screenContext';
import { writeToLog } from '../db';
import { formatClockTime } from '../dates';
import { FormActions } from '../FormActions';
import { currentShift } from '../shifts';
import { useJobList } from '../useLog';
import type { PanelProps } from './LogActions';
import '../log.css';

/** The notes with `line` added on a new line. */
export function appendLine(notes: string, line: string): string {
  return notes.trim() === '' ? line : `${notes.replace(/\s+$/u, '')}\n${line}`;
}

export default function NoteForm({ value: note, onDone }: PanelProps<string>) {
  const { t, locale } = useScreenContext();
  const { shiftDate } = currentShift();
  const open = useJobList({ fromDate: addDays(shiftDate, -1), status: OPEN_STATUSES });
  const [chosen, setChosen] = useState('');
  const [error, setError] = useState<string | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const title = useRef<HTMLHeadingElement>(null);
  useEffect(() => title.current?.focus(), []);
  if (note === undefined) return null;
  const jobs: Job[] = open.state === 'ready' ? open.value.jobs : [];
  const jobId = chosen || jobs[0]?.id || '';
  const label = (job: Job) =>
    [job.workOrder, job.partNumber, job.furnace, t(`jobs.status.${job.status}`), formatClockTime(job.createdAt, locale)]
      .filter(Boolean)
      .join(' · ');

  const add = async (event: Event) => {
    event.preventDefault();
    if (!jobId) return;
    setBusy(true);
    const result = await writeToLog((store) => store.modify(jobId, (job) => ({ notes: appendLine(job.notes, note) })));
    setBusy(false);
    if (!result.ok) {
      setError(describeJobsError(t, result.error));
      return;
    }
    onDone({ jobId, message: t('app.log.note.added', { job: label(result.value) }) });
  };

  return (
    <form class="card log-form" aria-labelledby="log-note-title" onSubmit={(e) => void add(e)} noValidate>
      <h2 id="log-note-title" ref={title} tabIndex={-1}>
        {t('app.log.note.title')}
      </h2>
      <p class="log-note-preview">{note}</p>
      {open.state === 'failed' && <p class="error-note">{describeJobsError(t, open.error)}</p>}
      {open.state === 'ready' && jobs.length === 0 && <p class="note">{t('app.log.note.noOpenJobs')}</p>}
      {jobs.length > 0 && (
        <ChoiceField
          id="log-note-job"
          label={t('app.log.note.job')}
          value={jobId}
          choices={jobs.map((job) => ({ value: job.id, label: label(job) }))}
          onChange={setChosen}
          hint={t('app.log.note.jobHint')}
        />
      )}
      <FormActions
        error={error}
        submitLabel={t('app.log.note.submit')}
        disabled={busy || !jobId}
        onCancel={() => onDone(undefined)}
      />
    </form>
  );
}
