/**
 * Quick picks from this device's own log: the part numbers and furnaces of its recent jobs,
 * most recently used first. A fresh install offers none (never the demo plant's).
 */
import { addDays, type Job } from '../../jobs';
import { currentShift } from './shifts';
import { useJobList } from './useLog';

export interface LogPicks {
  parts: readonly string[];
  furnaces: readonly string[];
}

/** How far back the picks look, and how many of each they offer (one row on a phone). */
export const PICK_DAYS = 90;
export const PICK_COUNT = 6;

export const NO_PICKS: LogPicks = { parts: [], furnaces: [] };

/** The distinct values of `jobs` (newest first), in that order, without blanks. */
export function picksFrom(jobs: readonly Job[], count = PICK_COUNT): LogPicks {
  const distinct = (values: readonly string[]) =>
    [...new Set(values.map((value) => value.trim()).filter((value) => value !== ''))].slice(0, count);
  return { parts: distinct(jobs.map((job) => job.partNumber)), furnaces: distinct(jobs.map((job) => job.furnace)) };
}

/** The picks of the last `PICK_DAYS` of the log, read again whenever the log changes. */
export function useLogPicks(): LogPicks {
  const list = useJobList({ fromDate: addDays(currentShift().shiftDate, -PICK_DAYS) });
  return list.state === 'ready' ? picksFrom(list.value.jobs) : NO_PICKS;
}
