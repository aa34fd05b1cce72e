/** Records in the log that no longer validate: reported by id with their first problems, never hidden. */
import { problemMessageKey, type CorruptRecord } from '../../jobs';
import { useT } from '../../i18n/useT';

/** Damaged records listed at most; the rest are counted. */
const SHOWN = 5;

export function DamagedRecords({ records }: { records: readonly CorruptRecord[] }) {
  const t = useT();
  if (records.length === 0) return null;
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
          </li>
        ))}
      </ul>
      {records.length > SHOWN && <p>{t('app.log.damaged.more', { count: records.length - SHOWN })}</p>}
      <p>{t('app.log.damaged.advice')}</p>
    </section>
  );
}
