/** The log's filter: words to look for, then dates, shift, furnace, part and status behind one tap. */
import { JOB_STATUSES, SHIFT_IDS, type ShiftId } from '../../jobs';
import { ChoiceField } from '../ui/ChoiceField';
import { Segmented } from '../ui/Segmented';
import { TextField } from '../ui/TextField';
import { useScreenContext } from '../settings/screenContext';
import { formatCalendarDate } from './dates';
import { filterForm, isCurrentShift, showCurrentShift, type FilterForm, type StatusChoice } from './filter';

/** Furnaces and parts offered by the filter: those of this device's log (recent, and seen this session). */
export function FilterPanel({ furnaces, parts }: { furnaces: readonly string[]; parts: readonly string[] }) {
  const { t, locale } = useScreenContext();
  const form = filterForm.value;
  const set = (changes: Partial<FilterForm>) => (filterForm.value = { ...form, ...changes });
  const any = { value: '', label: t('app.log.filter.any') };
  const statusChoices = [
    any,
    { value: 'open', label: t('app.log.filter.open') },
    ...JOB_STATUSES.map((s) => ({ value: s, label: t(`jobs.status.${s}`) })),
  ];
  return (
    <div class="log-filter">
      <TextField
        id="log-search"
        type="search"
        label={t('app.log.filter.search')}
        value={form.text}
        maxLength={80}
        hint={t('app.log.filter.searchHint')}
        onInput={(text) => set({ text })}
      />
      <details class="disclosure">
        <summary>
          <span>{t('app.log.filter.toggle')}</span>
          <span class="log-filter-summary">{describeFilter(form, t, locale)}</span>
        </summary>
        <div class="log-filter-body">
          <div class="field-grid">
            <TextField
              id="log-from"
              type="date"
              label={t('app.log.filter.from')}
              value={form.fromDate}
              onInput={(fromDate) => set({ fromDate })}
            />
            <TextField
              id="log-to"
              type="date"
              label={t('app.log.filter.to')}
              value={form.toDate}
              onInput={(toDate) => set({ toDate })}
            />
          </div>
          <Segmented
            name="log-shift"
            legend={t('app.log.filter.shift')}
            value={form.shift}
            choices={[any, ...SHIFT_IDS.map((s) => ({ value: s, label: s }))]}
            onChange={(v) => set({ shift: v as ShiftId | '' })}
          />
          <div class="field-grid">
            <ChoiceField
              wrap
              id="log-furnace"
              label={t('app.log.fields.furnace')}
              value={form.furnace}
              choices={[any, ...withCurrent(furnaces, form.furnace).map((f) => ({ value: f, label: f }))]}
              onChange={(furnace) => set({ furnace })}
            />
            <ChoiceField
              wrap
              id="log-part"
              label={t('app.log.fields.partNumber')}
              value={form.partNumber}
              choices={[any, ...withCurrent(parts, form.partNumber).map((p) => ({ value: p, label: p }))]}
              onChange={(partNumber) => set({ partNumber })}
            />
          </div>
          <ChoiceField
            id="log-status"
            label={t('app.log.fields.status')}
            value={form.status}
            choices={statusChoices}
            onChange={(v) => set({ status: v as StatusChoice })}
          />
          <div class="button-row">
            <button type="button" class="button" disabled={isCurrentShift(form)} onClick={() => showCurrentShift()}>
              {t('app.log.filter.currentShift')}
            </button>
            <button type="button" class="button" onClick={() => set({ fromDate: '', toDate: '', shift: '' })}>
              {t('app.log.filter.allDates')}
            </button>
          </div>
        </div>
      </details>
    </div>
  );
}

const withCurrent = (values: readonly string[], current: string) =>
  current && !values.includes(current) ? [...values, current] : values;

/** The filter in a few words, e.g. "Shift B · Wed, 5 Mar 2025 · F1". */
export function describeFilter(
  form: FilterForm,
  t: (key: string, params?: Record<string, string>) => string,
  locale: string,
): string {
  const from = form.fromDate ? formatCalendarDate(form.fromDate, locale) : '';
  const to = form.toDate ? formatCalendarDate(form.toDate, locale) : '';
  const dates =
    !from && !to
      ? t('app.log.filter.allDatesShort')
      : from === to
        ? from
        : t('app.log.filter.dateRange', { from: from || '…', to: to || '…' });
  const parts = [
    form.shift ? t(`jobs.shift.${form.shift}`) : t('app.log.filter.allShifts'),
    dates,
    form.furnace,
    form.partNumber,
    form.status === 'open' ? t('app.log.filter.open') : form.status ? t(`jobs.status.${form.status}`) : '',
  ];
  return parts.filter(Boolean).join(' · ');
}
