/**
 * Fields of a job changed on two devices: every value is kept and shown here, with who wrote it,
 * until a person picks the one to keep. Nothing is decided by the devices' clocks.
 */
import { useState } from 'preact/hooks';
import * as v from 'valibot';
import { JOB_STATUSES, LabResultSchema, SHIFT_IDS, type Alternative, type JobEntry } from '../../jobs';
import { ErrorNote } from '../ui/Notices';
import { useScreenContext } from '../settings/screenContext';
import { writeToLog } from './db';
import { formatCalendarDate } from './dates';
import { fieldName } from './fieldNames';
import { labRows } from './jobRows';
import { staleSentence } from './refusal';

type Wording = ReturnType<typeof useScreenContext>;

/** A kept value in words; values with no short wording (a plan, a prediction) are numbered. */
function valueText(field: string, alt: Alternative, index: number, ctx: Wording): string {
  const { t, locale } = ctx;
  const value = alt.value;
  if (value === undefined || value === '') return t('app.log.detail.emptyValue');
  if (field === 'status' && (JOB_STATUSES as readonly unknown[]).includes(value))
    return t(`jobs.status.${value as string}`);
  if (field === 'shift' && (SHIFT_IDS as readonly unknown[]).includes(value)) return t(`jobs.shift.${value as string}`);
  if (field === 'shiftDate' && typeof value === 'string') return formatCalendarDate(value, locale);
  if (field === 'lab') {
    const lab = v.safeParse(LabResultSchema, value);
    if (lab.success) {
      return labRows(lab.output, { t, show: ctx.show, locale })
        .map((row) => `${row.label} ${row.value}`)
        .join(' · ');
    }
  }
  if (field === 'steel' && typeof value === 'object' && value !== null && 'gradeName' in value)
    return String(value.gradeName);
  if (typeof value === 'string') return value;
  return t('app.log.detail.versionN', { n: index + 1 });
}

/** A value as a person typed it (notes, a part number), shown as written, not as the app words figures. */
const typedText = (field: string, alt: Alternative) =>
  typeof alt.value === 'string' && alt.value !== '' && !['status', 'shift', 'shiftDate'].includes(field);

export function OpenChoices({ entry, onSaved }: { entry: JobEntry; onSaved: (message: string) => void }) {
  const ctx = useScreenContext();
  const { t } = ctx;
  const [error, setError] = useState<string | undefined>(undefined);
  const fields = Object.keys(entry.open);
  if (fields.length === 0) return null;
  const keep = async (field: string, alt: Alternative) => {
    setError(undefined);
    const result = await writeToLog((store) =>
      store.update(entry.job.id, { [field]: alt.value }, { baseRev: entry.rev, settle: [field] }),
    );
    if (result.ok) onSaved(t('app.log.detail.kept', { field: fieldName(t, field) }));
    else setError(staleSentence(t, result.error));
  };
  return (
    <section class="card open-choices" aria-labelledby="open-choices-title">
      <h2 id="open-choices-title">{t('app.log.detail.twoDevices')}</h2>
      <ErrorNote message={error} />
      {fields.map((field) => (
        <fieldset key={field} class="open-choice" data-field={field}>
          <legend>{fieldName(t, field)}</legend>
          <ul>
            {(entry.open[field] ?? []).map((alt, i) => (
              <li key={alt.version}>
                <span class="open-choice-value" data-literal={typedText(field, alt) || undefined}>
                  {valueText(field, alt, i, ctx)}
                </span>
                {alt.by && <span class="note"> {t('app.log.detail.byUser', { name: alt.by })}</span>}
                <button type="button" class="button" onClick={() => void keep(field, alt)}>
                  {t('app.log.detail.keepValue')}
                </button>
              </li>
            ))}
          </ul>
        </fieldset>
      ))}
    </section>
  );
}
