/**
 * The import merge rule: records are matched by id and the newer `updatedAt` wins.
 * A record identical to the local one is unchanged; one that is not newer than the local
 * copy is skipped (the local copy is kept); a local copy that no longer validates is replaced.
 */
import type { Job } from './schema';

export type MergeDecision = 'add' | 'update' | 'unchanged' | 'skipOlder';

export interface ImportReport {
  added: number;
  updated: number;
  unchanged: number;
  skippedOlder: number;
}

/** JSON with keys sorted at every level: equal text means equal records. */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    typeof v === 'object' && v !== null && !Array.isArray(v)
      ? Object.fromEntries(
          Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)),
        )
      : v,
  );
}

/** `local` is the stored record (valid), `'corrupt'` when it failed validation, or undefined. */
export function decideMerge(local: Job | 'corrupt' | undefined, incoming: Job): MergeDecision {
  if (local === undefined) return 'add';
  if (local === 'corrupt') return 'update';
  if (canonicalJson(local) === canonicalJson(incoming)) return 'unchanged';
  return incoming.updatedAt > local.updatedAt ? 'update' : 'skipOlder';
}

/** Within one file, keep the newest version of each id (a file should not repeat ids, but may). */
export function newestById(jobs: readonly Job[]): Job[] {
  const byId = new Map<string, Job>();
  for (const job of jobs) {
    const seen = byId.get(job.id);
    if (!seen || job.updatedAt > seen.updatedAt) byId.set(job.id, job);
  }
  return [...byId.values()];
}

export const emptyReport = (): ImportReport => ({ added: 0, updated: 0, unchanged: 0, skippedOlder: 0 });

export function countDecision(report: ImportReport, decision: MergeDecision): void {
  if (decision === 'add') report.added++;
  else if (decision === 'update') report.updated++;
  else if (decision === 'unchanged') report.unchanged++;
  else report.skippedOlder++;
}
