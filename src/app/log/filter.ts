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

/** The current-shift filter last put in place, to tell whether the person has changed it since. */
let placedShift = currentShiftForm();

export const filterForm = signal<FilterForm>(placedShift);

const sameForm = (a: FilterForm, b: FilterForm) =>
  (Object.keys(a) as (keyof FilterForm)[]).every((key) => a[key] === b[key]);

/**
 * Called when the log is opened: a filter still showing the shift that was current when it was
 * set moves on to the shift running now (an app left open over a shift change); a filter the
 * person changed stays as it is.
 */
export function followCurrentShift(now: Date = new Date()): void {
  const current = currentShiftForm(now);
  if (sameForm(filterForm.value, placedShift) && !sameForm(current, placedShift)) {
    placedShift = current;
    filterForm.value = current;
  }
}

/** Back to the shift running now (the "current shift" button). */
export function showCurrentShift(now: Date = new Date()): void {
  placedShift = currentShiftForm(now);
  filterForm.value = placedShift;
}

/** Whether the filter shows exactly the shift running now and nothing narrower. */
export function isCurrentShift(form: FilterForm, now: Date = new Date()): boolean {
  return sameForm(form, currentShiftForm(now));
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
