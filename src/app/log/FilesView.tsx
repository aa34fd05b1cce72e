/**
 * The log as files: CSV for spreadsheets and the full JSON backup as downloads, and a backup
 * read back in. An import is checked whole before anything changes, then merged (the newer
 * copy of each job wins; nothing is deleted) and its counts reported.
 */
import { useState } from 'preact/hooks';
import {
  describeJobsError,
  exportBackup,
  exportCsv,
  exportFileName,
  importBackup,
  succeed,
  type ExportFile,
  type JobsResult,
  type JobStore,
} from '../../jobs';
import { language } from '../../i18n/useT';
import { ErrorNote } from '../ui/Notices';
import { Segmented } from '../ui/Segmented';
import { useScreenContext } from '../settings/screenContext';
import { APP_VERSION } from '../version';
import { jobStore, writeToLog } from './db';
import { formatMoment } from './dates';
import { DemoData } from './DemoData';
import { useLogRead } from './useLog';
import { downloadText } from './download';

type DecimalMark = '.' | ',';

/** Languages whose spreadsheets expect a decimal comma (and so a semicolon between cells). */
const COMMA_LANGUAGES = new Set(['es', 'de']);

interface Outcome {
  ok: boolean;
  text: string;
}

export function FilesView() {
  const { t } = useScreenContext();
  const [decimalMark, setDecimalMark] = useState<DecimalMark>(COMMA_LANGUAGES.has(language.value) ? ',' : '.');
  const [exported, setExported] = useState<Outcome | undefined>(undefined);
  const [imported, setImported] = useState<Outcome | undefined>(undefined);
  const [busy, setBusy] = useState(false);
  const [progress, setProgress] = useState<{ done: number; total: number } | undefined>(undefined);
  const { locale } = useScreenContext();

  const download = async (kind: 'csv' | 'json') => {
    setBusy(true);
    setExported(undefined);
    const store = await jobStore();
    const file: JobsResult<ExportFile> = !store.ok
      ? store
      : kind === 'csv'
        ? await exportCsv(store.value, { decimalMark })
        : await exportBackup(store.value, APP_VERSION);
    setBusy(false);
    if (!file.ok) {
      setExported({ ok: false, text: describeJobsError(t, file.error) });
      return;
    }
    const name = exportFileName(kind);
    downloadText(file.value.text, name, kind === 'csv' ? 'text/csv;charset=utf-8' : 'application/json');
    const skipped = file.value.skipped;
    setExported({
      ok: skipped.length === 0,
      text: [
        t('app.log.files.exported', { count: file.value.jobCount, name }),
        ...(skipped.length ? [t('jobs.exportSkipped', { count: skipped.length, id: skipped[0]!.key })] : []),
      ].join(' '),
    });
  };

  const pick = async (input: HTMLInputElement) => {
    const file = input.files?.[0];
    input.value = ''; // the same file can be chosen again
    if (!file) return;
    setBusy(true);
    setImported(undefined);
    const text = await file.text();
    const result = await writeToLog((store) =>
      importBackup(store, text, { onProgress: (done, total) => setProgress({ done, total }) }),
    );
    setBusy(false);
    setProgress(undefined);
    setImported(
      result.ok
        ? { ok: true, text: t('jobs.importReport', { ...result.value }) }
        : { ok: false, text: describeJobsError(t, result.error) },
    );
  };

  return (
    <>
      <h1 tabIndex={-1}>{t('app.log.files.title')}</h1>
      <section class="card" aria-labelledby="files-export">
        <h2 id="files-export">{t('app.log.files.exportHeading')}</h2>
        <p class="note">{t('app.log.files.exportIntro')}</p>
        <button type="button" class="button button-primary" disabled={busy} onClick={() => void download('json')}>
          {t('app.log.files.backup')}
        </button>
        <Segmented
          name="files-decimal"
          legend={t('app.log.files.decimalMark')}
          value={decimalMark}
          choices={[
            { value: '.', label: t('app.log.files.point') },
            { value: ',', label: t('app.log.files.comma') },
          ]}
          onChange={(v) => setDecimalMark(v as DecimalMark)}
        />
        <button type="button" class="button" disabled={busy} onClick={() => void download('csv')}>
          {t('app.log.files.csv')}
        </button>
        <div aria-live="polite">
          {exported && (exported.ok ? <p class="log-saved">{exported.text}</p> : <ErrorNote message={exported.text} />)}
        </div>
      </section>

      <section class="card" aria-labelledby="files-import">
        <h2 id="files-import">{t('app.log.files.importHeading')}</h2>
        <p class="note">{t('app.log.files.importIntro')}</p>
        <label class="button file-pick" for="files-import-input">
          {t('app.log.files.choose')}
          <input
            id="files-import-input"
            class="file-input"
            type="file"
            accept=".json,application/json"
            disabled={busy}
            onChange={(e) => void pick(e.currentTarget)}
          />
        </label>
        {progress && (
          <p class="note import-progress">
            <progress max={progress.total} value={progress.done} />{' '}
            {t('app.log.files.importProgress', { done: progress.done, total: progress.total })}
          </p>
        )}
        <div aria-live="polite">
          {imported && (imported.ok ? <p class="log-saved">{imported.text}</p> : <ErrorNote message={imported.text} />)}
        </div>
      </section>
      <MigrationNote locale={locale} />

      <DemoData />
    </>
  );
}

const readMigration = (store: JobStore) => Promise.resolve(succeed(store.migration));

/** What the one-time move from the earlier log on this device found, once it has run. */
function MigrationNote({ locale }: { locale: string }) {
  const { t } = useScreenContext();
  const loaded = useLogRead(null, readMigration);
  if (loaded.state !== 'ready' || !loaded.value || loaded.value.total === 0) return null;
  const report = loaded.value;
  return (
    <p class="note migration-note">
      {t('app.log.files.migrated', {
        moved: report.moved,
        damaged: report.damaged,
        date: formatMoment(report.at, locale),
      })}
    </p>
  );
}
