/**
 * Valibot issues turned into our own problems: a readable path (`jobs[3].lab.ecdMm`) and a
 * problem code with a message in every locale, so a rejected file says what is wrong and where.
 */
import type { BaseIssue } from 'valibot';
import type { FieldIssue, ProblemCode } from './result';

/** Issues reported at most, so a thoroughly broken file gives a readable message. */
export const MAX_REPORTED_ISSUES = 5;
/** Longest piece of the offending value quoted back. */
const MAX_QUOTED_CHARS = 40;

const VALIDATION_PROBLEMS: Record<string, ProblemCode> = {
  min_length: 'tooShort',
  max_length: 'tooLong',
  min_value: 'tooSmall',
  gt_value: 'tooSmall',
  max_value: 'tooLarge',
  lt_value: 'tooLarge',
};

const CHOICE_TYPES = new Set(['picklist', 'variant', 'literal', 'union']);

/** Key names quoted back as they are; anything else (it came from the file) is shown as `[?]`. */
const PLAIN_KEY = /^[A-Za-z_][A-Za-z0-9_-]{0,39}$/u;

/** `["jobs", 3, "operator"]` → `jobs[3].operator`; the whole value is `(root)`. */
export function formatPath(keys: readonly unknown[]): string {
  const text = keys
    .map((key) => (typeof key === 'number' ? `[${key}]` : PLAIN_KEY.test(String(key)) ? `.${String(key)}` : '[?]'))
    .join('')
    .replace(/^\./u, '');
  return text === '' ? '(root)' : text;
}

function quote(value: string): string {
  return value.length > MAX_QUOTED_CHARS ? `${value.slice(0, MAX_QUOTED_CHARS)}…` : value;
}

function problemOf(issue: BaseIssue<unknown>): ProblemCode {
  if (issue.kind === 'schema') {
    if (issue.type.endsWith('object') && issue.received === 'undefined') return 'missing';
    if (issue.type === 'strict_object' && issue.expected === 'never') return 'unknownField';
    if (CHOICE_TYPES.has(issue.type)) return 'notOneOf';
    return 'wrongType';
  }
  return VALIDATION_PROBLEMS[issue.type] ?? (issue.type === 'check' ? 'invalid' : 'badFormat');
}

export function issueOf(issue: BaseIssue<unknown>, prefix: readonly (string | number)[] = []): FieldIssue {
  const keys = [...prefix, ...(issue.path ?? []).map((item) => item.key)];
  return {
    path: formatPath(keys),
    problem: problemOf(issue),
    // Only what the schema expected is quoted back, never the offending value: it came from
    // the file and may be anything.
    ...(issue.expected ? { params: { expected: quote(issue.expected) } } : {}),
  };
}

/** The first few issues, as our problems. */
export function issuesOf(
  issues: readonly BaseIssue<unknown>[],
  prefix: readonly (string | number)[] = [],
): FieldIssue[] {
  return issues.slice(0, MAX_REPORTED_ISSUES).map((issue) => issueOf(issue, prefix));
}
