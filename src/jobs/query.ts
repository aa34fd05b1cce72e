/**
 * Filtering the log: whether a job matches a filter, and the list order (newest first). The
 * store keeps every job in memory with its search text folded once, so a filter is one pass.
 */
import type { JobStatus, Job } from './schema';
import { DEFAULT_SHIFT_CONFIG, shiftOf, type IsoDate, type ShiftConfig, type ShiftId } from './shift';

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

/** The filter the log opens with: the shift running at `now`. */
export function currentShiftFilter(now: Date, config: ShiftConfig = DEFAULT_SHIFT_CONFIG): JobFilter {
  const { shift, shiftDate } = shiftOf(now, config);
  return { fromDate: shiftDate, toDate: shiftDate, shift };
}

const statusList = (status: JobFilter['status']): readonly JobStatus[] =>
  status === undefined ? [] : typeof status === 'string' ? [status] : status;

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

/** The text a search looks in, folded once (the log keeps it beside each job). */
export function searchableText(job: Job): string {
  return foldText([job.workOrder, job.partNumber, job.notes, job.operator].join('\n'));
}

/** Whether a job meets every part of the filter. `words` are searchWords(filter.text), computed once. */
export function matchesFilter(
  job: Job,
  filter: JobFilter,
  words: readonly string[] = searchWords(filter.text),
  haystack?: string,
): boolean {
  if (filter.fromDate !== undefined && job.shiftDate < filter.fromDate) return false;
  if (filter.toDate !== undefined && job.shiftDate > filter.toDate) return false;
  if (filter.shift !== undefined && job.shift !== filter.shift) return false;
  if (filter.furnace !== undefined && job.furnace !== filter.furnace) return false;
  if (filter.partNumber !== undefined && job.partNumber !== filter.partNumber) return false;
  const statuses = statusList(filter.status);
  if (statuses.length > 0 && !statuses.includes(job.status)) return false;
  if (words.length > 0) {
    const text = haystack ?? searchableText(job);
    if (!words.every((word) => text.includes(word))) return false;
  }
  return true;
}

/** Newest first by creation time; the id breaks ties so the order is stable. */
export function compareNewestFirst(a: Job, b: Job): number {
  if (a.createdAt !== b.createdAt) return a.createdAt < b.createdAt ? 1 : -1;
  return a.id < b.id ? 1 : a.id > b.id ? -1 : 0;
}
