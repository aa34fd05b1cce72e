/**
 * What the log shows: the filter as the person set it (dates, shift, furnace, part, status,
 * words), opened on the shift running now. Kept for the session, not across reloads: the log
 * always opens on the current shift.
 */
import { signal } from '@preact/signals';
import { OPEN_STATUSES, type JobFilter, type JobStatus, type ShiftId } from '../../jobs';
import { currentShift } from './shifts';

/** A status, all open ones, or '' for any. */
export type StatusChoice = JobStatus | 'open' | '';

export interface FilterForm {
  fromDate: string;
  toDate: string;
  shift: ShiftId | '';
  furnace: string;
  partNumber: string;
  status: StatusChoice;
  text: string;
}

export function currentShiftForm(now: Date = new Date()): FilterForm {
  const { shift, shiftDate } = currentShift(now);
  return { fromDate: shiftDate, toDate: shiftDate, shift, furnace: '', partNumber: '', status: '', text: '' };
}

export const filterForm = signal<FilterForm>(currentShiftForm());

/** Whether the filter shows exactly the shift running now and nothing narrower. */
export function isCurrentShift(form: FilterForm, now: Date = new Date()): boolean {
  const current = currentShiftForm(now);
  return (Object.keys(current) as (keyof FilterForm)[]).every((key) => form[key] === current[key]);
}

/** The store's filter for the form; empty entries filter nothing. */
export function toJobFilter(form: FilterForm): JobFilter {
  const text = form.text.trim();
  return {
    ...(form.fromDate ? { fromDate: form.fromDate } : {}),
    ...(form.toDate ? { toDate: form.toDate } : {}),
    ...(form.shift ? { shift: form.shift } : {}),
    ...(form.furnace ? { furnace: form.furnace } : {}),
    ...(form.partNumber ? { partNumber: form.partNumber } : {}),
    ...(form.status === 'open' ? { status: OPEN_STATUSES } : form.status ? { status: form.status } : {}),
    ...(text ? { text } : {}),
  };
}
