/**
 * The job log on a document database (PouchDB: IndexedDB in the browser, replicated to the shop
 * server when there is one). Each job is one document, checked by the job schema on the way in and
 * on the way out. An edit names the revision it started from and is refused when the job has moved
 * on since, so an open form never writes old values over newer ones. Copies of a job that changed
 * on two devices are merged field by field (`fieldMerge.ts`), never by clock.
 */
import * as v from 'valibot';
import {
  docOfJob,
  editedDoc,
  isJobDoc,
  sameValue,
  TRACKED_FIELDS,
  versionsOf,
  type FieldVersions,
  type JobDoc,
} from './documents';
import { mergeDocs } from './fieldMerge';
import { issuesOf } from './issues';
import {
  damagedRecords,
  LEGACY_DB_NAME,
  migrateLegacyLog,
  saveDamaged,
  type DamagedRecord,
  type LegacyOptions,
  type MigrationReport,
} from './legacyLog';
import { LogIndex, type CorruptRecord, type JobEntry } from './logIndex';
import { clampFuture, emptyReport, type ImportReport } from './merge';
import { applyChanges, nextTimestamp, tidyEntry } from './normalize';
import { pouchError, type LogDatabase, type PouchFactory, type StoredDoc, type WriteResult } from './pouch';
import type { JobFilter } from './query';
import { failWith, succeed, type FieldIssue, type JobsResult } from './result';
import { JobChangesSchema, JobDraftSchema, JobSchema, type Job, type JobChanges } from './schema';
import { DEFAULT_SHIFT_CONFIG, shiftOf, type ShiftConfig } from './shift';
import { storageFailure } from './storageErrors';

export type { CorruptRecord, JobEntry } from './logIndex';
export type { DamagedRecord, MigrationReport } from './legacyLog';

export const DEFAULT_DB_NAME = 'casefront-log';

export interface OpenOptions extends LegacyOptions {
  /** Database name (tests and the demo use their own). */
  name?: string;
  /** Makes the database: pouchdb-browser in the app, the in-memory adapter in Node. */
  pouch: PouchFactory;
  /** The earlier log to move in once (default `casefront-job-log`); false: none. */
  legacyName?: string | false;
  /** The signed-in server user, stamped on every revision written here. */
  user?: () => string | undefined;
}

export interface JobList {
  jobs: Job[];
  corrupt: CorruptRecord[];
}

export interface AddOptions {
  now?: Date;
  shiftConfig?: ShiftConfig;
}

export interface EditOptions {
  now?: Date;
  /** The revision the edit started from: if the job has changed since, the edit is refused. */
  baseRev?: string;
  /** Fields kept from two devices that this edit decides (the value given is the one picked). */
  settle?: readonly string[];
}

export interface ImportOptions {
  now?: Date;
  /** Change ids per job and field, as a backup file carries them. */
  history?: Record<string, { versions: FieldVersions; open?: JobDoc['open'] }>;
  /** Called after each batch: jobs done so far and in all. */
  onProgress?: (done: number, total: number) => void;
}

/** Writes retried when another tab or the replication wrote the same job in between. */
const WRITE_ATTEMPTS = 25;
/** Jobs merged per database write (and per progress step) on import. */
const IMPORT_BATCH = 500;
/** Changes read per step when catching up. */
const CHANGES_BATCH = 1000;

function isConflict(error: unknown): boolean {
  return pouchError(error).status === 409;
}

function writeFailure<T>(result: WriteResult): JobsResult<T> {
  return storageFailure(result);
}

export async function openJobStore(options: OpenOptions): Promise<JobsResult<JobStore>> {
  let db: LogDatabase;
  try {
    db = options.pouch(options.name ?? DEFAULT_DB_NAME);
    await db.info();
  } catch (error) {
    return storageFailure(error);
  }
  let migration: MigrationReport | undefined;
  if (options.legacyName !== false) {
    const moved = await migrateLegacyLog(db, options.legacyName ?? LEGACY_DB_NAME, options);
    if (!moved.ok) {
      await db.close().catch(() => undefined);
      return moved;
    }
    migration = moved.value;
  }
  const store = new JobStore(db, options.user ?? (() => undefined), migration);
  const loaded = await store.refresh();
  return loaded.ok ? succeed(store) : loaded;
}

export class JobStore {
  #closed = false;
  readonly #index = new LogIndex();
  #seq: number | string = 0;
  #catchingUp: Promise<JobsResult<void>> | undefined;
  #writing: Promise<void> = Promise.resolve();
  /** Conflicts already tried (id and revisions), so a merge that cannot be written is not retried in a loop. */
  readonly #tried = new Set<string>();

  constructor(
    readonly db: LogDatabase,
    private readonly user: () => string | undefined,
    /** What the one-time move from the earlier log found; undefined when there was none. */
    readonly migration: MigrationReport | undefined,
  ) {}

  get closed(): boolean {
    return this.#closed;
  }

  close(): void {
    this.#closed = true;
    void this.db.close().catch(() => undefined);
  }

  /** Reads what changed in the database since the last look (this tab, another tab, the server). */
  refresh(): Promise<JobsResult<void>> {
    if (this.#closed) return Promise.resolve(failWith('storage.closed'));
    const previous = this.#catchingUp ?? Promise.resolve(succeed(undefined));
    const next = previous.then(() => this.#catchUp());
    this.#catchingUp = next;
    return next;
  }

  async #catchUp(): Promise<JobsResult<void>> {
    try {
      for (;;) {
        const batch = await this.db.changes({
          since: this.#seq,
          include_docs: true,
          conflicts: true,
          limit: CHANGES_BATCH,
        });
        for (const row of batch.results) this.#index.apply(row.id, row.deleted ? undefined : row.doc);
        this.#seq = batch.last_seq;
        if (batch.results.length < CHANGES_BATCH) break;
      }
      if (this.#index.conflicted.size > 0 && (await this.#resolveConflicts())) return await this.#catchUp();
      return succeed(undefined);
    } catch (error) {
      return storageFailure(error);
    }
  }

  /**
   * Merges every job that arrived with conflicting revisions: the merged copy is written on the
   * branch whose status it keeps (so the server sees no status change the writer may not make) and
   * the other branches are closed, naming the branch they went into. True when anything was written.
   */
  async #resolveConflicts(): Promise<boolean> {
    let wrote = false;
    for (const id of [...this.#index.conflicted]) {
      const winner = await this.db.get(id, { conflicts: true });
      const key = `${id}@${[winner._rev, ...(winner._conflicts ?? [])].sort().join(',')}`;
      if (this.#tried.has(key)) continue;
      this.#tried.add(key);
      const losers = await Promise.all((winner._conflicts ?? []).map((rev) => this.db.get(id, { rev })));
      const leaves: JobDoc[] = [winner, ...losers].filter((leaf) => isJobDoc(leaf));
      if (leaves.length < 2) continue;
      const merged = leaves.slice(1).reduce((acc, leaf) => mergeDocs(acc, leaf).doc, leaves[0]!);
      if (!v.safeParse(JobSchema, merged.job).success) continue;
      const parent = leaves.find((leaf) => sameValue(leaf.job.status, merged.job.status)) ?? leaves[0]!;
      const { _conflicts: _ignored, ...body } = merged;
      const by = this.user();
      const writes: StoredDoc[] = [
        { ...body, _id: id, _rev: parent._rev!, ...(by ? { changedBy: by } : {}) },
        ...[winner, ...losers]
          .filter((leaf) => leaf._rev !== parent._rev)
          .map((leaf) => ({
            _id: id,
            _rev: leaf._rev!,
            _deleted: true,
            type: 'job',
            mergedInto: parent._rev!,
            ...(by ? { changedBy: by } : {}),
          })),
      ];
      const results = await this.db.bulkDocs(writes);
      if (results.some((r) => r.ok)) wrote = true;
    }
    return wrote;
  }

  async #read<T>(work: () => T): Promise<JobsResult<T>> {
    const fresh = await this.refresh();
    return fresh.ok ? succeed(work()) : fresh;
  }

  async #getDoc(id: string): Promise<StoredDoc | undefined> {
    try {
      return await this.db.get(id);
    } catch (error) {
      if (pouchError(error).status === 404) return undefined;
      throw error;
    }
  }

  /** Logs a new job: id, timestamps and (unless given) the shift of `now` are set here. */
  async add(draft: unknown, options: AddOptions = {}): Promise<JobsResult<Job>> {
    if (this.#closed) return failWith('storage.closed');
    const parsed = v.safeParse(JobDraftSchema, tidyEntry(draft));
    if (!parsed.success) return failWith('record.invalid', undefined, issuesOf(parsed.issues));
    const now = options.now ?? new Date();
    const slot = shiftOf(now, options.shiftConfig ?? DEFAULT_SHIFT_CONFIG);
    const stamp = now.toISOString();
    const job = v.safeParse(JobSchema, {
      ...parsed.output,
      id: crypto.randomUUID(),
      createdAt: stamp,
      updatedAt: stamp,
      shift: parsed.output.shift ?? slot.shift,
      shiftDate: parsed.output.shiftDate ?? slot.shiftDate,
    });
    if (!job.success) return failWith('record.invalid', undefined, issuesOf(job.issues));
    try {
      const result = await this.db.put(docOfJob(job.output, this.user()) as unknown as StoredDoc);
      if (!result.ok) return writeFailure(result);
    } catch (error) {
      return storageFailure(error);
    }
    await this.refresh();
    return succeed(job.output);
  }

  /** Stores complete records (demo data, restores): new ids are added, known ones edited to match. */
  async putMany(records: readonly unknown[]): Promise<JobsResult<number>> {
    if (this.#closed) return failWith('storage.closed');
    const jobs: Job[] = [];
    for (const [index, record] of records.entries()) {
      const parsed = v.safeParse(JobSchema, record);
      if (!parsed.success) return failWith('record.invalid', undefined, issuesOf(parsed.issues, [index]));
      jobs.push(parsed.output);
    }
    try {
      for (let i = 0; i < jobs.length; i += IMPORT_BATCH) {
        const batch = jobs.slice(i, i + IMPORT_BATCH);
        const { rows } = await this.db.allDocs({ keys: batch.map((job) => job.id), include_docs: true });
        const docs = batch.map((job, j) => {
          const current = rows[j]?.doc;
          return current && isJobDoc(current)
            ? editedDoc(current, { ...job }, { changedBy: this.user() })
            : { ...docOfJob(job, this.user()), ...(current?._rev ? { _rev: current._rev } : {}) };
        });
        const results = await this.db.bulkDocs(docs as unknown as StoredDoc[]);
        const failed = results.find((r) => r.error);
        if (failed) return writeFailure(failed);
      }
    } catch (error) {
      return storageFailure(error);
    }
    await this.refresh();
    return succeed(jobs.length);
  }

  /**
   * Applies an edit. With `baseRev` (the revision the form or the tap started from), the edit is
   * refused as `record.stale` when a field it writes has changed since that revision (those fields are
   * named), so it never goes over a newer value; changes meanwhile to other fields stay, as a merge
   * of different fields would keep them. Without `baseRev` (a repair, a restore), it is applied to the
   * job as it is now. Either way it is redone if another writer came in between.
   */
  async update(id: string, changes: unknown, options: EditOptions = {}): Promise<JobsResult<Job>> {
    const parsed = v.safeParse(JobChangesSchema, tidyEntry(changes));
    if (!parsed.success) return failWith('record.invalid', undefined, issuesOf(parsed.issues));
    return this.#edit(id, () => succeed(parsed.output), options);
  }

  /**
   * Edits a job from its state at the moment of writing: a note appended from two tabs (or two
   * devices) at once keeps both lines.
   */
  async modify(id: string, change: (current: Job) => unknown, options: { now?: Date } = {}): Promise<JobsResult<Job>> {
    return this.#edit(
      id,
      (raw) => {
        const current = v.safeParse(JobSchema, raw.job);
        if (!current.success) return failWith('record.invalid', { id }, issuesOf(current.issues));
        const next = v.safeParse(JobChangesSchema, tidyEntry(change(current.output)));
        return next.success ? succeed(next.output) : failWith('record.invalid', undefined, issuesOf(next.issues));
      },
      options,
    );
  }

  /**
   * The fields among `written` that changed between the revision `baseRev` and `current`; every one
   * of them when that revision can no longer be read (it is then unknown what changed).
   */
  async #changedMeanwhile(
    id: string,
    baseRev: string,
    current: JobDoc,
    written: readonly string[],
  ): Promise<FieldIssue[]> {
    let base: StoredDoc | undefined;
    try {
      base = await this.db.get(id, { rev: baseRev });
    } catch {
      base = undefined;
    }
    const fields = TRACKED_FIELDS.filter(
      (field) => written.includes(field) && (!isJobDoc(base) || !sameValue(base.job[field], current.job[field])),
    );
    return fields.map((field) => ({ path: field, problem: 'changedMeanwhile' as const }));
  }

  /** Runs writes of this tab one after another, so they contend only with other tabs and devices. */
  #serial<T>(work: () => Promise<T>): Promise<T> {
    const run = this.#writing.then(work, work);
    this.#writing = run.then(
      () => undefined,
      () => undefined,
    );
    return run;
  }

  #edit(
    id: string,
    changesFor: (raw: JobDoc) => JobsResult<JobChanges>,
    options: EditOptions,
  ): Promise<JobsResult<Job>> {
    return this.#serial(() => this.#editNow(id, changesFor, options));
  }

  async #editNow(
    id: string,
    changesFor: (raw: JobDoc) => JobsResult<JobChanges>,
    options: EditOptions,
  ): Promise<JobsResult<Job>> {
    if (this.#closed) return failWith('storage.closed');
    const now = options.now ?? new Date();
    try {
      for (let attempt = 0; attempt < WRITE_ATTEMPTS; attempt++) {
        const current = await this.#getDoc(id);
        if (!current || !isJobDoc(current)) return failWith('record.notFound', { id });
        const changes = changesFor(current);
        if (!changes.ok) return changes;
        if (options.baseRev !== undefined && current._rev !== options.baseRev) {
          const written = [...Object.keys(changes.value), ...(options.settle ?? [])];
          const clash = await this.#changedMeanwhile(id, options.baseRev, current, written);
          if (clash.length > 0) return failWith('record.stale', { id }, clash);
        }
        const merged = applyChanges(current.job, changes.value);
        merged.updatedAt = nextTimestamp(now, current.job.updatedAt);
        const job = v.safeParse(JobSchema, merged);
        if (!job.success) return failWith('record.invalid', undefined, issuesOf(job.issues));
        const next = editedDoc(current, { ...job.output }, { changedBy: this.user(), settle: options.settle ?? [] });
        try {
          const result = await this.db.put(next as unknown as StoredDoc);
          if (!result.ok) return writeFailure(result);
        } catch (error) {
          if (!isConflict(error)) throw error;
          // Another tab wrote in between: wait a moment (so two tabs do not keep colliding), then redo.
          await new Promise((resolve) => setTimeout(resolve, Math.random() * 5 * (attempt + 1)));
          continue;
        }
        await this.refresh();
        return succeed(job.output);
      }
      return failWith('storage.failed', { name: 'TooManyWriters' });
    } catch (error) {
      return storageFailure(error);
    }
  }

  async get(id: string): Promise<JobsResult<Job>> {
    const entry = await this.entry(id);
    return entry.ok ? succeed(entry.value.job) : entry;
  }

  /** One job with its revision and the fields kept from two devices. */
  async entry(id: string): Promise<JobsResult<JobEntry>> {
    const fresh = await this.refresh();
    if (!fresh.ok) return fresh;
    const entry = this.#index.entry(id);
    if (entry) return succeed(entry);
    const corrupt = this.#index.corruptRecord(id);
    return corrupt ? failWith('record.invalid', { id }, corrupt.issues) : failWith('record.notFound', { id });
  }

  /** Jobs matching the filter, newest first, with every damaged record beside them. */
  async list(filter: JobFilter = {}): Promise<JobsResult<JobList>> {
    const kept = await this.#damaged();
    return this.#read(() => ({
      jobs: this.#index.list(filter),
      corrupt: [
        ...this.#index.corrupt,
        ...kept.map(({ key, issues }) => ({ key, issues, source: 'migration' as const })),
      ],
    }));
  }

  /** Every job, newest first; damaged ones reported, none skipped silently. */
  async readAll(): Promise<JobsResult<JobList>> {
    return this.list({});
  }

  async count(): Promise<JobsResult<number>> {
    return this.#read(() => this.#index.size);
  }

  async #damaged(): Promise<DamagedRecord[]> {
    try {
      return (await damagedRecords(this.db)).records;
    } catch {
      return [];
    }
  }

  /** The damaged records as they were stored, for a file the person can keep or send on. */
  async damagedExport(): Promise<JobsResult<{ key: string; issues: FieldIssue[]; raw: unknown }[]>> {
    const kept = await this.#damaged();
    const fresh = await this.refresh();
    if (!fresh.ok) return fresh;
    const stored = await Promise.all(
      this.#index.corrupt.map(async (c) => ({ key: c.key, issues: c.issues, raw: await this.#getDoc(c.key) })),
    );
    return succeed([...kept.map(({ key, issues, raw }) => ({ key, issues, raw })), ...stored]);
  }

  /** Deletes a damaged record kept from the earlier log (jobs themselves are never deleted). */
  async deleteDamaged(key: string): Promise<JobsResult<void>> {
    try {
      const kept = await this.#damaged();
      if (!kept.some((d) => d.key === key)) return failWith('record.notDamaged', { id: key });
      await saveDamaged(
        this.db,
        kept.filter((d) => d.key !== key),
      );
      return succeed(undefined);
    } catch (error) {
      return storageFailure(error);
    }
  }

  /**
   * Merges validated records into the log field by field: a field changed only in the file or only
   * here takes that change; one changed on both sides keeps both values for a person to pick. With no
   * change history for a job (an older file), every field that differs is kept both ways. Timestamps
   * far in the future are set to now. Written in batches, with progress after each.
   */
  async merge(incoming: readonly Job[], options: ImportOptions = {}): Promise<JobsResult<ImportReport>> {
    if (this.#closed) return failWith('storage.closed');
    const now = options.now ?? new Date();
    const report = emptyReport();
    const byId = new Map<string, Job>();
    for (const original of incoming) {
      const { job, clamped } = clampFuture(original, now);
      if (clamped) report.clamped++;
      byId.set(job.id, job);
    }
    const jobs = [...byId.values()];
    const by = this.user();
    try {
      for (let i = 0; i < jobs.length; i += IMPORT_BATCH) {
        const batch = jobs.slice(i, i + IMPORT_BATCH);
        const { rows } = await this.db.allDocs({ keys: batch.map((job) => job.id), include_docs: true });
        const writes: StoredDoc[] = [];
        batch.forEach((job, j) => {
          const current = rows[j]?.doc;
          const history = options.history?.[job.id];
          const fileDoc: JobDoc = {
            ...docOfJob(job, by),
            versions: history?.versions ?? {},
            ...(history?.open ? { open: history.open } : {}),
          };
          if (!current || !isJobDoc(current)) {
            report.added += current ? 0 : 1;
            report.updated += current ? 1 : 0;
            writes.push({ ...fileDoc, ...(current?._rev ? { _rev: current._rev } : {}) });
            return;
          }
          const { doc, conflicted } = mergeDocs(current, fileDoc, history !== undefined);
          if (conflicted.length > 0) report.conflicts++;
          const same =
            sameValue(doc.job, current.job) &&
            sameValue(doc.versions, versionsOf(current)) &&
            sameValue(doc.open ?? {}, current.open ?? {});
          if (same) {
            report.unchanged++;
            return;
          }
          report.updated++;
          const { _conflicts: _ignored, ...body } = doc;
          writes.push({ ...body, _rev: current._rev!, ...(by ? { changedBy: by } : {}) });
        });
        if (writes.length > 0) {
          const results = await this.db.bulkDocs(writes);
          const failed = results.find((r) => r.error);
          if (failed) return writeFailure(failed);
        }
        options.onProgress?.(Math.min(i + IMPORT_BATCH, jobs.length), jobs.length);
        // Let the page draw and answer between batches.
        await new Promise((resolve) => setTimeout(resolve, 0));
      }
    } catch (error) {
      return storageFailure(error);
    }
    await this.refresh();
    return succeed(report);
  }

  /** Change history of every job, for a backup file (so a later import can merge field by field). */
  async history(): Promise<JobsResult<Record<string, { versions: FieldVersions; open?: JobDoc['open'] }>>> {
    return this.#read(() => {
      const out: Record<string, { versions: FieldVersions; open?: JobDoc['open'] }> = {};
      for (const job of this.#index.list({})) {
        const entry = this.#index.entry(job.id)!;
        out[job.id] = {
          versions: entry.versions,
          ...(Object.keys(entry.open).length > 0 ? { open: entry.open } : {}),
        };
      }
      return out;
    });
  }
}
