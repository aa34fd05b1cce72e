/**
 * Record version 2 and its conversion to version 3. Version 3 adds one optional field: a cycle
 * recipe's `diffusivityFactor`, the furnace factor on D its prediction was made with (version 2
 * recorded it for closed-form requests only). A version-2 cycle job recorded none, so it keeps
 * none (read as 1); every other field keeps its value and its place. Checked with the version-3
 * schema, whose inputs are physics' own request descriptions.
 */
import * as v from 'valibot';
import { issuesOf } from '../issues';
import type { FieldIssue } from '../result';
import { JobSchema, type Job } from '../schema';

/** One version-2 record as version 3, or the problems that stop it (the upgrade then leaves it as it was). */
export function jobFromV2(raw: unknown): { ok: true; job: Job } | { ok: false; issues: FieldIssue[] } {
  // The shapes agree field for field: nothing to move, only to check against version 3.
  const parsed = v.safeParse(JobSchema, raw);
  return parsed.success ? { ok: true, job: parsed.output } : { ok: false, issues: issuesOf(parsed.issues) };
}
