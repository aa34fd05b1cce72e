/**
 * The full backup: our own plain JSON format,
 * `{ format: "casefront-job-log", version, exportedAt, appVersion, jobs: [...] }`,
 * where `version` is the job record version, and `history`: each job's change ids per field (and
 * the values kept from two devices), so that reading the file back merges field by field. Import
 * checks the whole file first and changes nothing unless every record is valid.
 */
import * as v from 'valibot';
import { issuesOf } from './issues';
import { failWith, succeed, type JobsResult } from './result';
import { JOB_RECORD_VERSION, JobSchema, TimestampSchema, type Job } from './schema';
import { compareNewestFirst } from './query';

export const BACKUP_FORMAT = 'casefront-job-log';

const ChangeIdsSchema = v.array(v.pipe(v.string(), v.minLength(1), v.maxLength(40)));

const AlternativeSchema = v.object({
  value: v.optional(v.unknown()),
  version: v.pipe(v.string(), v.maxLength(40)),
  by: v.optional(v.pipe(v.string(), v.maxLength(80))),
});

export const JobHistorySchema = v.strictObject({
  versions: v.record(v.string(), ChangeIdsSchema),
  open: v.optional(v.record(v.string(), v.array(AlternativeSchema))),
});

export const BackupSchema = v.strictObject({
  format: v.literal(BACKUP_FORMAT),
  version: v.literal(JOB_RECORD_VERSION),
  exportedAt: TimestampSchema,
  appVersion: v.pipe(v.string(), v.minLength(1), v.maxLength(40)),
  jobs: v.array(JobSchema),
  history: v.optional(v.record(v.string(), JobHistorySchema)),
});

export type Backup = v.InferOutput<typeof BackupSchema>;
export type JobHistory = v.InferOutput<typeof JobHistorySchema>;

export function createBackup(
  jobs: readonly Job[],
  appVersion: string,
  now: Date = new Date(),
  history?: Record<string, JobHistory>,
): Backup {
  return {
    format: BACKUP_FORMAT,
    version: JOB_RECORD_VERSION,
    exportedAt: now.toISOString(),
    appVersion,
    jobs: [...jobs].sort(compareNewestFirst).reverse(),
    ...(history ? { history } : {}),
  };
}

export function backupToJson(backup: Backup): string {
  return `${JSON.stringify(backup, null, 1)}\n`;
}

const isObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** Reads and checks a backup file's text; nothing is stored here. */
export function parseBackup(text: string): JobsResult<Backup> {
  let data: unknown;
  try {
    data = JSON.parse(text.replace(/^\uFEFF/u, ''));
  } catch {
    return failWith('import.notJson');
  }
  if (!isObject(data) || data.format !== BACKUP_FORMAT) return failWith('import.wrongFormat');
  if (data.version !== JOB_RECORD_VERSION && data.version !== 2) {
    return failWith('import.unsupportedVersion', {
      version: typeof data.version === 'number' ? data.version : String(data.version),
      supported: JOB_RECORD_VERSION,
    });
  }
  // A version-2 file's jobs are read as the upgrade reads a version-2 database (jobFromV2: no field moves).
  const parsed = v.safeParse(BackupSchema, { ...data, version: JOB_RECORD_VERSION });
  if (parsed.success) return succeed(parsed.output);
  const issues = issuesOf(parsed.issues);
  return failWith('import.invalid', { count: parsed.issues.length }, issues);
}
