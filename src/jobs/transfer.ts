/**
 * Moving the log in and out of the device as files: the JSON backup (export and import)
 * and the CSV for spreadsheets. The screens turn the text into a download; nothing here
 * sends anything anywhere.
 */
import { backupToJson, createBackup, parseBackup } from './backup';
import { jobsToCsv, type CsvOptions } from './csv';
import type { ImportReport } from './merge';
import { succeed, type JobsResult } from './result';
import { localIsoDate } from './shift';
import type { CorruptRecord, ImportOptions, JobStore } from './store';

export interface ExportFile {
  text: string;
  jobCount: number;
  /** Damaged records that could not be written; the screens must say so. */
  skipped: CorruptRecord[];
}

/** The whole log as a backup file's text. */
export async function exportBackup(
  store: JobStore,
  appVersion: string,
  now: Date = new Date(),
): Promise<JobsResult<ExportFile>> {
  const all = await store.readAll();
  if (!all.ok) return all;
  const history = await store.history();
  if (!history.ok) return history;
  const text = backupToJson(createBackup(all.value.jobs, appVersion, now, history.value));
  return succeed({ text, jobCount: all.value.jobs.length, skipped: all.value.corrupt });
}

/** Checks the whole file, then merges it into the log field by field (`JobStore.merge`). */
export async function importBackup(
  store: JobStore,
  text: string,
  options: Omit<ImportOptions, 'history'> = {},
): Promise<JobsResult<ImportReport>> {
  const backup = parseBackup(text);
  if (!backup.ok) return backup;
  return store.merge(backup.value.jobs, {
    ...options,
    ...(backup.value.history ? { history: backup.value.history } : {}),
  });
}

/** The whole log, oldest first, as CSV. */
export async function exportCsv(store: JobStore, options: CsvOptions = {}): Promise<JobsResult<ExportFile>> {
  const all = await store.readAll();
  if (!all.ok) return all;
  const jobs = [...all.value.jobs].reverse();
  return succeed({ text: await jobsToCsv(jobs, options), jobCount: jobs.length, skipped: all.value.corrupt });
}

/** A file name with the date, e.g. `casefront-job-log-2025-03-04.json`. */
export function exportFileName(kind: 'json' | 'csv', now: Date = new Date()): string {
  return `casefront-job-log-${localIsoDate(now)}.${kind}`;
}
