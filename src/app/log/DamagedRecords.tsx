/**
 * Records in the log that do not validate: reported by id with their first problems, never hidden.
 * They can be written to a file as they are stored (to keep or send on), and those kept aside from
 * the earlier log can be deleted once looked after; a job in the log itself is never deleted.
 */
import { useState } from 'preact/hooks';
import { describeJobsError, exportFileName, problemMessageKey, type CorruptRecord } from '../../jobs';
import { useT } from '../../i18n/useT';
import { jobStore, writeToLog } from './db';
import { downloadText } from './download';

/** Damaged records listed at most; the rest are counted. */
const SHOWN = 5;

export function DamagedRecords({ records }: { records: readonly CorruptRecord[] }) {
  const t = useT();
  const [message, setMessage] = useState<string | undefined>(undefined);
  if (records.length === 0) return null;
  const download = async () => {
    const store = await jobStore();
    const file = store.ok ? await store.value.damagedExport() : store;
    if (!file.ok) {
      setMessage(describeJobsError(t, file.error));
      return;
    }
    const name = exportFileName('json').replace('.json', '-damaged.json');
    downloadText(`${JSON.stringify(file.value, null, 1)}\n`, name, 'application/json');
    setMessage(t('app.log.damaged.exported', { count: file.value.length, name }));
  };
  const remove = async (key: string) => {
    const result = await writeToLog((store) => store.deleteDamaged(key));
    setMessage(result.ok ? t('app.log.damaged.deleted', { id: key }) : describeJobsError(t, result.error));
  };
  return (
    <section class="error-note damaged" aria-labelledby="damaged-title">
      <h2 id="damaged-title">{t('app.log.damaged.title', { count: records.length })}</h2>
      <ul>
        {records.slice(0, SHOWN).map((record) => (
          <li key={record.key}>
            {t('jobs.corruptRecord', { id: record.key })}
            {record.issues.slice(0, 2).map((issue, i) => {
              const { key, params } = problemMessageKey(issue);
              return (
                <span key={i} class="damaged-issue">
                  {t(key, params)}
                </span>
              );
            })}
            {record.source === 'migration' && (
              <>
                <span class="damaged-issue">{t('app.log.damaged.fromMigration')}</span>
                <button type="button" class="button" onClick={() => void remove(record.key)}>
                  {t('app.log.damaged.delete', { id: record.key })}
                </button>
              </>
            )}
          </li>
        ))}
      </ul>
      {records.length > SHOWN && <p>{t('app.log.damaged.more', { count: records.length - SHOWN })}</p>}
      <p>{t('app.log.damaged.advice')}</p>
      <button type="button" class="button" onClick={() => void download()}>
        {t('app.log.damaged.export')}
      </button>
      <div aria-live="polite">{message && <p>{message}</p>}</div>
    </section>
  );
}
