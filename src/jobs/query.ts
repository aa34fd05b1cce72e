/**
 * Filtering the log: which index narrows a filter best, whether a job matches it, and the
 * list order (newest first). The store reads through the index, then checks every job
 * against the whole filter, so the index choice only affects speed, never the answer.
 */
import type { JobStatus, Job } from './schema';
import { DEFAULT_SHIFT_CONFIG, shiftOf, type IsoDate, type ShiftConfig, type ShiftId } from './shift';
import { INDEX } from './migrations';

export interface JobFilter {
  /** First shift date, inclusive. */
  fromDate?: IsoDate;
  /** Last shift date, inclusive. */
  toDate?: IsoDate;
  shift?: ShiftId;
  furnace?: string;
  partNumber?: string;
  status?: JobStatus | readonly JobStatus[];
  /** Words looked up in work order, part number, notes and operator (all must occur). */
  text?: string;
}

const EARLIEST_DATE = '0000-01-01';
const LATEST_DATE = '9999-12-31';

/** The filter the log opens with: the shift running at `now`. */
export function currentShiftFilter(now: Date, config: ShiftConfig = DEFAULT_SHIFT_CONFIG): JobFilter {
  const { shift, shiftDate } = shiftOf(now, config);
  return { fromDate: shiftDate, toDate: shiftDate, shift };
}

export interface IndexPlan {
  index: string;
  range: IDBKeyRange;
}

const statusList = (status: JobFilter['status']): readonly JobStatus[] =>
  status === undefined ? [] : typeof status === 'string' ? [status] : status;

/** The index read for a filter, or undefined to read the whole store. */
export function planQuery(filter: JobFilter): IndexPlan | undefined {
  const hasDates = filter.fromDate !== undefined || filter.toDate !== undefined;
  const from = filter.fromDate ?? EARLIEST_DATE;
  const to = filter.toDate ?? LATEST_DATE;
  if (from > to) return { index: INDEX.shiftDate, range: IDBKeyRange.only('') };
  if (filter.furnace !== undefined && hasDates) {
    return { index: INDEX.furnaceShiftDate, range: IDBKeyRange.bound([filter.furnace, from], [filter.furnace, to]) };
  }
  if (hasDates) return { index: INDEX.shiftDate, range: IDBKeyRange.bound(from, to) };
  if (filter.furnace !== undefined) return { index: INDEX.furnace, range: IDBKeyRange.only(filter.furnace) };
  if (filter.partNumber !== undefined) return { index: INDEX.partNumber, range: IDBKeyRange.only(filter.partNumber) };
  const statuses = statusList(filter.status);
  if (statuses.length === 1) return { index: INDEX.status, range: IDBKeyRange.only(statuses[0]!) };
  return undefined;
}

/** Lower case without accents, so "nitrogeno" finds "Nitrógeno" and "OEL" finds "Öl". */
export function foldText(text: string): string {
  return text.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase();
}

export function searchWords(text: string | undefined): string[] {
  return text === undefined
    ? []
    : foldText(text)
        .split(/\s+/u)
        .filter((w) => w !== '');
}

function searchableText(job: Job): string {
  return foldText([job.workOrder, job.partNumber, job.notes, job.operator].join('\n'));
}

/** Whether a job meets every part of the filter. `words` are searchWords(filter.text), computed once. */
export function matchesFilter(
  job: Job,
  filter: JobFilter,
  words: readonly string[] = searchWords(filter.text),
): boolean {
  if (filter.fromDate !== undefined && job.shiftDate < filter.fromDate) return false;
  if (filter.toDate !== undefined && job.shiftDate > filter.toDate) return false;
  if (filter.shift !== undefined && job.shift !== filter.shift) return false;
  if (filter.furnace !== undefined && job.furnace !== filter.furnace) return false;
  if (filter.partNumber !== undefined && job.partNumber !== filter.partNumber) return false;
  const statuses = statusList(filter.status);
  if (statuses.length > 0 && !statuses.includes(job.status)) return false;
  if (words.length > 0) {
    const haystack = searchableText(job);
    if (!words.every((word) => haystack.includes(word))) return false;
  }
  return true;
}

/** Newest first by creation time; the id breaks ties so the order is stable. */
export function compareNewestFirst(a: Job, b: Job): number {
  if (a.createdAt !== b.createdAt) return a.createdAt < b.createdAt ? 1 : -1;
  return a.id < b.id ? 1 : a.id > b.id ? -1 : 0;
}
