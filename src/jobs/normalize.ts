/**
 * Tidying what a person typed before it is checked: surrounding spaces go from the short
 * fields and initials are upper-cased. Notes are kept exactly as written.
 */
const TRIMMED_FIELDS = ['operator', 'furnace', 'workOrder', 'partNumber'] as const;

export function tidyEntry(input: unknown): unknown {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) return input;
  const tidy: Record<string, unknown> = { ...(input as Record<string, unknown>) };
  for (const field of TRIMMED_FIELDS) {
    const value = tidy[field];
    if (typeof value === 'string') tidy[field] = value.trim();
  }
  if (typeof tidy.operator === 'string') tidy.operator = tidy.operator.toUpperCase();
  return tidy;
}

/** A copy of `base` with `changes` applied; a change to `undefined` removes the field. */
export function applyChanges(base: Record<string, unknown>, changes: Record<string, unknown>): Record<string, unknown> {
  const removed = new Set(Object.keys(changes).filter((key) => changes[key] === undefined));
  return Object.fromEntries(Object.entries({ ...base, ...changes }).filter(([key]) => !removed.has(key)));
}

/** An update time later than both now and the previous one, so "newest wins" always holds. */
export function nextTimestamp(now: Date, previousIso: unknown): string {
  const previousMs = typeof previousIso === 'string' ? Date.parse(previousIso) : Number.NaN;
  const nowMs = now.getTime();
  return new Date(Number.isNaN(previousMs) || nowMs > previousMs ? nowMs : previousMs + 1).toISOString();
}
