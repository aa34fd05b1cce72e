/**
 * Two copies of one job merged field by field, never by wall clock. For each field the change
 * ids tell which side has seen the other's latest change: that side's value is the newer one.
 * When both changed it (neither has seen the other's change) and the values differ, both values
 * are kept under `open` and shown on the job until a person picks. The result is the same
 * whichever device works it out, so devices that merge the same two copies agree.
 */
import {
  MAX_FIELD_VERSIONS,
  sameValue,
  TRACKED_FIELDS,
  versionsOf,
  type Alternative,
  type FieldVersions,
  type JobDoc,
} from './documents';

export interface MergeOutcome {
  doc: JobDoc;
  /** Fields changed on both sides to different values (kept both, open for a person). */
  conflicted: string[];
  /** Fields whose value came from `b`. */
  fromB: string[];
}

/** FNV-1a over the text, twice with different seeds: a short id that every device computes alike. */
function stableId(text: string): string {
  const hash = (seed: number) => {
    let h = seed;
    for (let i = 0; i < text.length; i++) {
      h ^= text.charCodeAt(i);
      h = Math.imul(h, 0x01000193) >>> 0;
    }
    return h.toString(16).padStart(8, '0');
  };
  return `m${hash(0x811c9dc5)}${hash(0x2b992ddf).slice(0, 3)}`;
}

const unique = (ids: readonly (string | undefined)[]): string[] => [
  ...new Set(ids.filter((id): id is string => id !== undefined)),
];

function alternativesOf(doc: JobDoc, field: string, versions: FieldVersions): Alternative[] {
  const open = doc.open?.[field];
  if (open && open.length > 0) return open;
  const value = doc.job[field];
  return [
    {
      ...(value === undefined ? {} : { value }),
      version: versions[field]?.[0] ?? 'original',
      ...(doc.changedBy ? { by: doc.changedBy } : {}),
    },
  ];
}

/** One alternative per distinct value, first seen first. */
function distinctValues(alternatives: readonly Alternative[]): Alternative[] {
  const seen: Alternative[] = [];
  for (const alt of alternatives) if (!seen.some((s) => sameValue(s.value, alt.value))) seen.push(alt);
  return seen;
}

function setField(target: Record<string, unknown>, field: string, value: unknown): void {
  if (value === undefined) Reflect.deleteProperty(target, field);
  else target[field] = value;
}

/**
 * `a` merged with `b`; `a` is the copy kept where a choice is open (its value stays shown first).
 * `bHistoryKnown` is false for a record without change ids (an old backup file): then every field
 * whose value differs is kept both ways.
 */
export function mergeDocs(a: JobDoc, b: JobDoc, bHistoryKnown = true): MergeOutcome {
  const va = versionsOf(a);
  const vb = bHistoryKnown ? versionsOf(b) : {};
  const job: Record<string, unknown> = { ...a.job };
  const versions: FieldVersions = { ...va };
  const open: Record<string, Alternative[]> = { ...(a.open ?? {}) };
  const conflicted: string[] = [];
  const fromB: string[] = [];

  const takeB = (field: string) => {
    setField(job, field, b.job[field]);
    if (vb[field]) versions[field] = vb[field];
    else Reflect.deleteProperty(versions, field);
    const bOpen = b.open?.[field];
    if (bOpen) open[field] = bOpen;
    else Reflect.deleteProperty(open, field);
    fromB.push(field);
  };

  for (const field of TRACKED_FIELDS) {
    const fa = va[field] ?? [];
    const fb = vb[field] ?? [];
    const [ha, hb] = [fa[0], fb[0]];
    const equal = sameValue(a.job[field], b.job[field]);
    if (bHistoryKnown && ha !== hb) {
      if (ha === undefined || fb.includes(ha)) {
        takeB(field);
        continue;
      }
      if (hb === undefined || fa.includes(hb)) continue;
    }
    if (equal) {
      if (ha !== hb) versions[field] = unique([ha, hb, ...fa, ...fb]).slice(0, MAX_FIELD_VERSIONS);
      const bothOpen = distinctValues([...(a.open?.[field] ?? []), ...(b.open?.[field] ?? [])]);
      if (bothOpen.length > 1) open[field] = bothOpen;
      continue;
    }
    // Both changed it (or b's history is unknown) to different values: keep every value.
    const alternatives = distinctValues([...alternativesOf(a, field, va), ...alternativesOf(b, field, vb)]);
    open[field] = alternatives;
    const mergeId = stableId(
      [ha ?? '', hb ?? '', ...alternatives.map((alt) => JSON.stringify(alt.value ?? null))].sort().join('|'),
    );
    versions[field] = unique([mergeId, ha, hb, ...fa, ...fb]).slice(0, MAX_FIELD_VERSIONS);
    conflicted.push(field);
  }

  job.createdAt = String(a.job.createdAt) <= String(b.job.createdAt) ? a.job.createdAt : b.job.createdAt;
  job.updatedAt = String(a.job.updatedAt) >= String(b.job.updatedAt) ? a.job.updatedAt : b.job.updatedAt;
  const doc: JobDoc = { ...a, job, versions };
  if (Object.keys(open).length > 0) doc.open = open;
  else delete doc.open;
  return { doc, conflicted, fromB };
}
