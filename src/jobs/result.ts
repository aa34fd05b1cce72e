/**
 * Typed outcomes of the job log. Like the physics layer, the job log does not throw for
 * things a user or a device can cause (a full disk, a bad backup file, a missing record):
 * it returns `{ ok: false, error }`, where `error.code` is a key under `jobs.errors.` in
 * every locale and `params` fills that message's placeholders.
 */

export const JOBS_ERROR_CODES = [
  'storage.full',
  'storage.unavailable',
  'storage.failed',
  'storage.closed',
  'storage.newerVersion',
  'record.notFound',
  'record.invalid',
  'record.stale',
  'record.notDamaged',
  'import.notJson',
  'import.wrongFormat',
  'import.unsupportedVersion',
  'import.invalid',
  'shiftConfig.invalid',
] as const;

export type JobsErrorCode = (typeof JOBS_ERROR_CODES)[number];

/** One problem found by validation: where (a path like `jobs[3].operator`) and what (a key under `jobs.problems.`). */
export interface FieldIssue {
  path: string;
  problem: ProblemCode;
  params?: Record<string, string | number>;
}

export const PROBLEM_CODES = [
  'missing',
  'wrongType',
  'badFormat',
  'tooShort',
  'tooLong',
  'tooSmall',
  'tooLarge',
  'notOneOf',
  'unknownField',
  'invalid',
  'changedMeanwhile',
] as const;

export type ProblemCode = (typeof PROBLEM_CODES)[number];

export interface JobsError {
  code: JobsErrorCode;
  params?: Record<string, string | number>;
  /** For validation failures: the first few problems, each with its path. */
  issues?: FieldIssue[];
}

export type JobsResult<T> = { ok: true; value: T } | { ok: false; error: JobsError };

export const succeed = <T>(value: T): JobsResult<T> => ({ ok: true, value });

export const failWith = <T = never>(
  code: JobsErrorCode,
  params?: JobsError['params'],
  issues?: FieldIssue[],
): JobsResult<T> => ({
  ok: false,
  error: { code, ...(params ? { params } : {}), ...(issues ? { issues } : {}) },
});

/** The translation key and values for an error, for the screens to pass to `t()`. */
export function jobsErrorMessageKey(error: JobsError): { key: string; params: Record<string, string | number> } {
  return { key: `jobs.errors.${error.code}`, params: error.params ?? {} };
}

/** The translation key and values for one validation problem. */
export function problemMessageKey(issue: FieldIssue): { key: string; params: Record<string, string | number> } {
  return { key: `jobs.problems.${issue.problem}`, params: { path: issue.path, ...issue.params } };
}

/** A translate function such as i18next's `t`. */
export type Translate = (key: string, params?: Record<string, string | number>) => string;

/** Fields whose format deserves an example (a key under `jobs.hints.`). */
export const HINTED_FIELDS = ['operator', 'createdAt', 'updatedAt', 'shiftDate', 'measuredAt', 'id'] as const;

/** The translation key of the format hint for the field an issue points at, if there is one. */
export function hintMessageKey(issue: FieldIssue): string | undefined {
  const field = /(?:^|\.)([A-Za-z]+)$/u.exec(issue.path)?.[1];
  return field && (HINTED_FIELDS as readonly string[]).includes(field) ? `jobs.hints.${field}` : undefined;
}

/** The full sentence for an error, then its first problem and a format example when there is one. */
export function describeJobsError(t: Translate, error: JobsError): string {
  const main = jobsErrorMessageKey(error);
  const first = error.issues?.[0];
  if (!first) return t(main.key, main.params);
  const detail = problemMessageKey(first);
  const hint = hintMessageKey(first);
  return [t(main.key, main.params), t(detail.key, detail.params), ...(hint ? [t(hint)] : [])].join(' ');
}
