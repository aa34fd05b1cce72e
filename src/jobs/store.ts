/**
 * The job log in IndexedDB. Every write runs in one readwrite transaction, so a failure
 * (a full disk included) leaves the log as it was; every record read is validated, so a
 * damaged record is reported beside the list instead of breaking it.
 */
import { newJobId } from './ids';
import { openDB, type IDBPDatabase, type IDBPObjectStore } from 'idb';
import * as v from 'valibot';
import { issuesOf } from './issues';
import { countDecision, decideMerge, emptyReport, newestById, type ImportReport } from './merge';
import { JOBS_STORE, LATEST_DB_VERSION, runMigrations } from './migrations';
import { applyChanges, nextTimestamp, tidyEntry } from './normalize';
import { compareNewestFirst, matchesFilter, planQuery, searchWords, type JobFilter } from './query';
import { failWith, succeed, type FieldIssue, type JobsResult } from './result';
import { JobChangesSchema, JobDraftSchema, JobSchema, type Job, type JobChanges } from './schema';
import { DEFAULT_SHIFT_CONFIG, shiftOf, type ShiftConfig } from './shift';
import { rootCause, storageFailure } from './storageErrors';

export const DEFAULT_DB_NAME = 'casefront-job-log';

export interface OpenOptions {
  /** Database name (tests and the demo use their own). */
  name?: string;
  /** Another tab opened a newer version: this connection has closed; ask the user to reload. */
  onVersionChange?: () => void;
  /** An older tab still holds the database; the upgrade waits for it to close. */
  onBlocked?: () => void;
}

/** A stored record that failed validation: its key and what is wrong with it. */
export interface CorruptRecord {
  key: string;
  issues: FieldIssue[];
}

export interface JobList {
  jobs: Job[];
  corrupt: CorruptRecord[];
}

export interface AddOptions {
  now?: Date;
  shiftConfig?: ShiftConfig;
}

type WriteStore = IDBPObjectStore<unknown, ['jobs'], 'jobs', 'readwrite'>;

export async function openJobStore(options: OpenOptions = {}): Promise<JobsResult<JobStore>> {
  if (typeof indexedDB === 'undefined') return failWith('storage.unavailable');
  let store: JobStore | undefined;
  let upgradeError: unknown;
  try {
    const db = await openDB(options.name ?? DEFAULT_DB_NAME, LATEST_DB_VERSION, {
      upgrade(upgradeDb, oldVersion, newVersion, tx) {
        // A failed upgrade is reported by openDB rejecting; this promise would only repeat it.
        tx.done.catch(() => undefined);
        // An upgrade that fails part-way is rolled back whole.
        runMigrations(upgradeDb, tx, oldVersion, newVersion ?? LATEST_DB_VERSION).catch((error: unknown) => {
          upgradeError = error;
          try {
            tx.abort();
          } catch {
            // Already finished.
          }
        });
      },
      blocked: () => options.onBlocked?.(),
      blocking: (_current, _blocked, event) => {
        if (store) store.close();
        else (event.target as IDBDatabase).close();
        options.onVersionChange?.();
      },
    });
    store = new JobStore(db);
    return succeed(store);
  } catch (error) {
    // The device has a log from a newer release than this one (an old tab or cached app).
    if (error instanceof Error && error.name === 'VersionError') return failWith('storage.newerVersion');
    return storageFailure(rootCause(error, upgradeError));
  }
}

function validated(raw: unknown): { ok: true; job: Job } | { ok: false; corrupt: CorruptRecord } {
  const parsed = v.safeParse(JobSchema, raw);
  if (parsed.success) return { ok: true, job: parsed.output };
  const id = typeof raw === 'object' && raw !== null && 'id' in raw ? String(raw.id) : '?';
  return { ok: false, corrupt: { key: id, issues: issuesOf(parsed.issues) } };
}

function validateAll(raws: readonly unknown[]): JobList {
  const list: JobList = { jobs: [], corrupt: [] };
  for (const raw of raws) {
    const result = validated(raw);
    if (result.ok) list.jobs.push(result.job);
    else list.corrupt.push(result.corrupt);
  }
  return list;
}

function abortQuietly(tx: IDBTransaction | { abort(): void }): void {
  try {
    tx.abort();
  } catch {
    // The transaction already ended (it aborted itself on the failed request).
  }
}

/**
 * Issues one request per item and waits for all. If issuing throws part-way (a full disk can
 * make put() throw), the requests already issued still settle; they are marked handled so the
 * transaction's abort does not surface as stray rejections.
 */
async function allRequests<T>(items: readonly T[], issue: (item: T) => Promise<unknown>): Promise<void> {
  const pending: Promise<unknown>[] = [];
  try {
    for (const item of items) pending.push(issue(item));
  } catch (error) {
    for (const request of pending) request.catch(() => undefined);
    throw error;
  }
  await Promise.all(pending);
}

export class JobStore {
  #closed = false;

  constructor(private readonly db: IDBPDatabase) {}

  get closed(): boolean {
    return this.#closed;
  }

  close(): void {
    this.#closed = true;
    this.db.close();
  }

  /** Runs `work` in one readwrite transaction; anything but success leaves the store unchanged. */
  private async write<T>(work: (store: WriteStore) => Promise<JobsResult<T>>): Promise<JobsResult<T>> {
    if (this.#closed) return failWith('storage.closed');
    let tx;
    try {
      tx = this.db.transaction(JOBS_STORE, 'readwrite');
    } catch (error) {
      return storageFailure(error);
    }
    const finished: Promise<unknown> = tx.done.then(
      () => undefined,
      (error: unknown) => error ?? new Error('aborted'),
    );
    let outcome: JobsResult<T>;
    try {
      outcome = await work(tx.store);
    } catch (error) {
      abortQuietly(tx);
      return storageFailure(rootCause(error, await finished));
    }
    if (!outcome.ok) {
      abortQuietly(tx);
      await finished;
      return outcome;
    }
    const failure = await finished;
    return failure === undefined ? outcome : storageFailure(failure);
  }

  private async read<T>(work: (db: IDBPDatabase) => Promise<T>): Promise<JobsResult<T>> {
    if (this.#closed) return failWith('storage.closed');
    try {
      return succeed(await work(this.db));
    } catch (error) {
      return storageFailure(error);
    }
  }

  /** Logs a new job: id, timestamps and (unless given) the shift of `now` are set here. */
  async add(draft: unknown, options: AddOptions = {}): Promise<JobsResult<Job>> {
    const parsed = v.safeParse(JobDraftSchema, tidyEntry(draft));
    if (!parsed.success) return failWith('record.invalid', undefined, issuesOf(parsed.issues));
    const now = options.now ?? new Date();
    const slot = shiftOf(now, options.shiftConfig ?? DEFAULT_SHIFT_CONFIG);
    const stamp = now.toISOString();
    const job = v.safeParse(JobSchema, {
      ...parsed.output,
      id: newJobId(),
      createdAt: stamp,
      updatedAt: stamp,
      shift: parsed.output.shift ?? slot.shift,
      shiftDate: parsed.output.shiftDate ?? slot.shiftDate,
    });
    if (!job.success) return failWith('record.invalid', undefined, issuesOf(job.issues));
    return this.write(async (store) => {
      await store.add(job.output);
      return succeed(job.output);
    });
  }

  /** Stores complete records as they are (demo data, restores), all or none. */
  async putMany(records: readonly unknown[]): Promise<JobsResult<number>> {
    const jobs: Job[] = [];
    for (const [index, record] of records.entries()) {
      const parsed = v.safeParse(JobSchema, record);
      if (!parsed.success) return failWith('record.invalid', undefined, issuesOf(parsed.issues, [index]));
      jobs.push(parsed.output);
    }
    return this.write(async (store) => {
      await allRequests(jobs, (job) => store.put(job));
      return succeed(jobs.length);
    });
  }

  /** Applies an edit; reading and writing happen in one transaction, so edits from two tabs both land. */
  async update(id: string, changes: unknown, options: { now?: Date } = {}): Promise<JobsResult<Job>> {
    const parsed = v.safeParse(JobChangesSchema, tidyEntry(changes));
    if (!parsed.success) return failWith('record.invalid', undefined, issuesOf(parsed.issues));
    return this.edit(id, () => succeed(parsed.output), options.now);
  }

  /**
   * Edits a job from its stored state at the moment of writing (read and written in one
   * transaction): a note appended from two tabs at once keeps both lines.
   */
  async modify(id: string, change: (current: Job) => unknown, options: { now?: Date } = {}): Promise<JobsResult<Job>> {
    return this.edit(
      id,
      (raw) => {
        const current = validated(raw);
        if (!current.ok) return failWith('record.invalid', { id }, current.corrupt.issues);
        const parsed = v.safeParse(JobChangesSchema, tidyEntry(change(current.job)));
        return parsed.success ? succeed(parsed.output) : failWith('record.invalid', undefined, issuesOf(parsed.issues));
      },
      options.now,
    );
  }

  private async edit(
    id: string,
    changesFor: (raw: Record<string, unknown>) => JobsResult<JobChanges>,
    now: Date = new Date(),
  ): Promise<JobsResult<Job>> {
    return this.write(async (store) => {
      const raw: unknown = await store.get(id);
      if (typeof raw !== 'object' || raw === null) return failWith('record.notFound', { id });
      const changes = changesFor(raw as Record<string, unknown>);
      if (!changes.ok) return changes;
      const merged = applyChanges(raw as Record<string, unknown>, changes.value);
      merged.updatedAt = nextTimestamp(now, (raw as Record<string, unknown>).updatedAt);
      const job = v.safeParse(JobSchema, merged);
      if (!job.success) return failWith('record.invalid', undefined, issuesOf(job.issues));
      await store.put(job.output);
      return succeed(job.output);
    });
  }

  async remove(id: string): Promise<JobsResult<void>> {
    return this.write(async (store) => {
      if ((await store.getKey(id)) === undefined) return failWith('record.notFound', { id });
      await store.delete(id);
      return succeed(undefined);
    });
  }

  /** Empties the log (used before a full restore and by tests). */
  async clear(): Promise<JobsResult<void>> {
    return this.write(async (store) => {
      await store.clear();
      return succeed(undefined);
    });
  }

  async get(id: string): Promise<JobsResult<Job>> {
    const raw = await this.read((db) => db.get(JOBS_STORE, id) as Promise<unknown>);
    if (!raw.ok) return raw;
    if (raw.value === undefined) return failWith('record.notFound', { id });
    const result = validated(raw.value);
    return result.ok ? succeed(result.job) : failWith('record.invalid', { id }, result.corrupt.issues);
  }

  /** Jobs matching the filter, newest first, with any damaged records met on the way. */
  async list(filter: JobFilter = {}): Promise<JobsResult<JobList>> {
    const plan = planQuery(filter);
    const raws = await this.read(
      (db) =>
        (plan ? db.getAllFromIndex(JOBS_STORE, plan.index, plan.range) : db.getAll(JOBS_STORE)) as Promise<unknown[]>,
    );
    if (!raws.ok) return raws;
    const { jobs, corrupt } = validateAll(raws.value);
    const words = searchWords(filter.text);
    return succeed({ jobs: jobs.filter((job) => matchesFilter(job, filter, words)).sort(compareNewestFirst), corrupt });
  }

  /** Every record, newest first; damaged ones reported, none skipped silently. */
  async readAll(): Promise<JobsResult<JobList>> {
    return this.list({});
  }

  async count(): Promise<JobsResult<number>> {
    return this.read((db) => db.count(JOBS_STORE));
  }

  /**
   * Merges validated records by id, newest `updatedAt` winning, in one transaction:
   * a failure part-way leaves the log exactly as it was.
   */
  async merge(incoming: readonly Job[]): Promise<JobsResult<ImportReport>> {
    const candidates = newestById(incoming);
    return this.write(async (store) => {
      const report = emptyReport();
      const locals = await Promise.all(candidates.map((job) => store.get(job.id) as Promise<unknown>));
      const toWrite = candidates.filter((job, i) => {
        const raw = locals[i];
        const local = raw === undefined ? undefined : validated(raw);
        const decision = decideMerge(local === undefined ? undefined : local.ok ? local.job : 'corrupt', job);
        countDecision(report, decision);
        return decision === 'add' || decision === 'update';
      });
      await allRequests(toWrite, (job) => store.put(job));
      return succeed(report);
    });
  }
}
