/**
 * What an import did, and the one rule for timestamps from elsewhere: a time more than a day
 * ahead of this device's clock is set to now (counted), so a job from a device with a wild
 * clock stays editable and sorts where it belongs. Which value of a field wins is decided by
 * the change history (`fieldMerge.ts`), never by these times.
 */
import type { Job } from './schema';

export { canonicalJson } from './canonical';

export interface ImportReport {
  added: number;
  /** Jobs that took changes from the file (merged field by field). */
  updated: number;
  unchanged: number;
  /** Jobs with a field changed both here and in the file: both values kept, shown on the job. */
  conflicts: number;
  /** Jobs whose timestamps lay far in the future and were set to the time of the import. */
  clamped: number;
}

/** How far ahead of this device's clock a timestamp may be before it counts as wrong. */
export const FUTURE_TOLERANCE_MS = 24 * 3600_000;

export const emptyReport = (): ImportReport => ({ added: 0, updated: 0, unchanged: 0, conflicts: 0, clamped: 0 });

/** The job with createdAt/updatedAt no later than `now` + the tolerance (else set to now). */
export function clampFuture(job: Job, now: Date): { job: Job; clamped: boolean } {
  const limit = now.getTime() + FUTURE_TOLERANCE_MS;
  const late = (iso: string) => Date.parse(iso) > limit;
  if (!late(job.createdAt) && !late(job.updatedAt)) return { job, clamped: false };
  const stamp = now.toISOString();
  return {
    job: {
      ...job,
      createdAt: late(job.createdAt) ? stamp : job.createdAt,
      updatedAt: late(job.updatedAt) ? stamp : job.updatedAt,
    },
    clamped: true,
  };
}
