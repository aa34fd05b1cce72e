/**
 * "Save to log" and "add to a job's notes" on the calculators. Only these buttons are in the
 * calculators' code: the form and the store behind it load when the button is first tapped.
 */
import type { ComponentType } from 'preact';
import { useRef, useState } from 'preact/hooks';
import { useT, withFullLocale } from '../../../i18n/useT';
import { hrefFor } from '../../shell/route';
import type { LogEntry } from '../entry';

/** What a panel reports when it has written to the log. */
export interface Saved {
  jobId: string;
  message: string;
}

export interface PanelProps<T> {
  value: T | undefined;
  onDone: (saved: Saved | undefined) => void;
}

type Loader<T> = () => Promise<{ default: ComponentType<PanelProps<T>> }>;

function LazyPanel<T>({
  value,
  label,
  load,
  id,
}: {
  value: T | undefined;
  label: string;
  load: Loader<T>;
  id: string;
}) {
  const t = useT();
  const [Panel, setPanel] = useState<ComponentType<PanelProps<T>> | null>(null);
  const [open, setOpen] = useState(false);
  const [failed, setFailed] = useState(false);
  const [saved, setSaved] = useState<Saved | undefined>(undefined);
  const button = useRef<HTMLButtonElement>(null);
  const start = () => {
    setSaved(undefined);
    setOpen(true);
    if (!Panel) {
      // The form's messages are in the locale's rest part.
      withFullLocale(load)()
        .then((mod) => setPanel(() => mod.default))
        .catch(() => setFailed(true));
    }
  };
  const done = (result: Saved | undefined) => {
    setOpen(false);
    setSaved(result);
    requestAnimationFrame(() => button.current?.focus());
  };
  if (open && Panel) return <Panel value={value} onDone={done} />;
  return (
    <div class="log-action" id={id}>
      {saved && (
        <p class="log-saved" role="status">
          {saved.message} <a href={hrefFor('log', 'job', saved.jobId)}>{t('app.log.save.openJob')}</a>
        </p>
      )}
      {failed && <p class="error-note">{t('app.shell.loadFailed')}</p>}
      <button
        ref={button}
        type="button"
        class="button button-wide"
        disabled={value === undefined || (open && !failed)}
        onClick={start}
      >
        {label}
      </button>
    </div>
  );
}

/** Saves the calculator's inputs and prediction as a new job. */
export function LogSaveButton({ entry }: { entry: LogEntry | undefined }) {
  const t = useT();
  return <LazyPanel id="log-save" value={entry} label={t('app.log.save.button')} load={() => import('./SaveForm')} />;
}

/** Adds a line (an upset and its recovery) to the notes of a job still open. */
export function LogNoteButton({ note }: { note: string | undefined }) {
  const t = useT();
  return <LazyPanel id="log-note" value={note} label={t('app.log.note.button')} load={() => import('./NoteForm')} />;
}
