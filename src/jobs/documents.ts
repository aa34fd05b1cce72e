/**
 * A job as a database document. The job record itself (`job`, checked by the valibot schema)
 * is wrapped with what replication needs: for every field, the ids of its last changes, newest
 * first (`versions`), so two copies of one job can be merged field by field without a clock;
 * the values kept from two devices that changed the same field (`open`), until a person picks;
 * and who wrote this revision (`changedBy`, checked by the server against its own user).
 */
import { canonicalJson } from './canonical';
import { JobSchema, type Job } from './schema';

export const JOB_DOC_TYPE = 'job';

/** Change ids kept per field; an older id falling off can only make a merge ask, never lose. */
export const MAX_FIELD_VERSIONS = 16;

/** Record fields merged one by one: everything but the identity and the timestamps. */
export const TRACKED_FIELDS: readonly string[] = Object.keys(JobSchema.entries).filter(
  (key) => !['id', 'createdAt', 'updatedAt'].includes(key),
);

/** A value kept from one side of a same-field change (absent `value` = the field was empty there). */
export interface Alternative {
  value?: unknown;
  version: string;
  by?: string;
}

export type FieldVersions = Record<string, string[]>;

export interface JobDoc {
  _id: string;
  _rev?: string;
  _conflicts?: string[];
  type: typeof JOB_DOC_TYPE;
  /** The job record (validated on every read). */
  job: Record<string, unknown>;
  /** Per field, the ids of its changes newest first; a field never changed has none. */
  versions: FieldVersions;
  /** Fields changed on two devices: every value, until a person picks one. */
  open?: Record<string, Alternative[]>;
  /** The server user who wrote this revision (empty on a device that has never signed in). */
  changedBy?: string;
}

export function newVersionId(): string {
  return crypto.randomUUID().replace(/-/gu, '').slice(0, 12);
}

export function isJobDoc(doc: unknown): doc is JobDoc & Record<string, unknown> {
  return (
    typeof doc === 'object' &&
    doc !== null &&
    (doc as { type?: unknown }).type === JOB_DOC_TYPE &&
    typeof (doc as { job?: unknown }).job === 'object' &&
    (doc as { job?: unknown }).job !== null
  );
}

/** The versions of a stored document, whatever it holds (a damaged one may hold anything). */
export function versionsOf(doc: { versions?: unknown }): FieldVersions {
  const raw = doc.versions;
  if (typeof raw !== 'object' || raw === null) return {};
  const versions: FieldVersions = {};
  for (const [field, ids] of Object.entries(raw as Record<string, unknown>)) {
    if (Array.isArray(ids)) versions[field] = ids.filter((id): id is string => typeof id === 'string');
  }
  return versions;
}

/** A new document for a job that has no history yet. */
export function docOfJob(job: Job, changedBy?: string): JobDoc {
  return { _id: job.id, type: JOB_DOC_TYPE, job: { ...job }, versions: {}, ...(changedBy ? { changedBy } : {}) };
}

export const sameValue = (a: unknown, b: unknown): boolean => canonicalJson(a) === canonicalJson(b);

/**
 * The document after a person's edit: each field whose value really changes gets a new change
 * id, and so does each field in `settle` (a same-field choice the person made); a change to a
 * field kept from two devices settles it too.
 */
export function editedDoc(
  doc: JobDoc,
  next: Record<string, unknown>,
  options: { changedBy?: string | undefined; settle?: readonly string[] } = {},
): JobDoc {
  const versions = { ...versionsOf(doc) };
  const open = { ...(doc.open ?? {}) };
  for (const field of TRACKED_FIELDS) {
    if (sameValue(doc.job[field], next[field]) && !options.settle?.includes(field)) continue;
    versions[field] = [newVersionId(), ...(versions[field] ?? [])].slice(0, MAX_FIELD_VERSIONS);
    Reflect.deleteProperty(open, field);
  }
  const edited: JobDoc = { ...doc, job: next, versions };
  if (Object.keys(open).length > 0) edited.open = open;
  else delete edited.open;
  if (options.changedBy) edited.changedBy = options.changedBy;
  else delete edited.changedBy;
  return edited;
}
