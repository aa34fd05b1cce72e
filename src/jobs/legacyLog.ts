/**
 * The one-time move from the earlier log (its own IndexedDB database, record version 2 after
 * the version 1 → 2 upgrade in `migrations/`) into the document database. Every record is
 * counted: a valid one becomes a job document, one that fails the schema is kept aside as damaged
 * with the reason (shown, exportable, deletable). Only when the new database is checked to hold
 * every record, job by job, is the old database deleted; until then it stays and the move is tried
 * again at the next start.
 */
import { openDB, type IDBPDatabase } from 'idb';
import * as v from 'valibot';
import { docOfJob, sameValue } from './documents';
import { issuesOf } from './issues';
import { JOBS_STORE, LATEST_DB_VERSION, runMigrations } from './migrations';
import type { LogDatabase, StoredDoc } from './pouch';
import { failWith, succeed, type FieldIssue, type JobsResult } from './result';
import { JobSchema } from './schema';
import { rootCause, storageFailure } from './storageErrors';

export const LEGACY_DB_NAME = 'casefront-job-log';
export const MIGRATION_DOC = '_local/casefront-migration';
export const DAMAGED_DOC = '_local/casefront-damaged';

/** What the move found and did. */
export interface MigrationReport {
  /** Records in the earlier log. */
  total: number;
  /** Valid records now held as jobs. */
  moved: number;
  /** Records kept aside as damaged. */
  damaged: number;
  /** Every record was found again in the new database; the old one was deleted. */
  verified: boolean;
  at: string;
}

/** A record kept aside: as it was stored, with the reason it failed. Never replicated. */
export interface DamagedRecord {
  key: string;
  raw: unknown;
  issues: FieldIssue[];
  source: 'migration';
  at: string;
}

export interface LegacyOptions {
  onBlocked?: () => void;
  onVersionChange?: () => void;
}

/** Whether a database of that name exists, without leaving an empty one behind. */
function legacyExists(name: string): Promise<boolean> {
  return new Promise((resolve) => {
    let created = false;
    const request = indexedDB.open(name);
    request.onupgradeneeded = () => {
      created = true;
      request.transaction?.abort();
    };
    request.onsuccess = () => {
      request.result.close();
      resolve(true);
    };
    request.onerror = () => resolve(!created && false);
  });
}

async function openLegacy(name: string, options: LegacyOptions): Promise<JobsResult<IDBPDatabase>> {
  let upgradeError: unknown;
  let db: IDBPDatabase | undefined;
  try {
    db = await openDB(name, LATEST_DB_VERSION, {
      upgrade(upgradeDb, oldVersion, newVersion, tx) {
        tx.done.catch(() => undefined);
        // An upgrade that fails part-way is rolled back whole, and the old records stay as they were.
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
      blocking: () => {
        db?.close();
        options.onVersionChange?.();
      },
    });
    return succeed(db);
  } catch (error) {
    if (error instanceof Error && error.name === 'VersionError') return failWith('storage.newerVersion');
    return storageFailure(rootCause(error, upgradeError));
  }
}

async function readLocal<T>(db: LogDatabase, id: string): Promise<T | undefined> {
  try {
    return (await db.get(id)) as unknown as T;
  } catch {
    return undefined;
  }
}

/** The damaged records kept from the move (empty when there were none). */
export async function damagedRecords(db: LogDatabase): Promise<{ rev?: string; records: DamagedRecord[] }> {
  const doc = await readLocal<StoredDoc & { records?: DamagedRecord[] }>(db, DAMAGED_DOC);
  return doc ? { ...(doc._rev ? { rev: doc._rev } : {}), records: doc.records ?? [] } : { records: [] };
}

export async function saveDamaged(db: LogDatabase, records: DamagedRecord[]): Promise<void> {
  const current = await damagedRecords(db);
  await db.put({ _id: DAMAGED_DOC, ...(current.rev ? { _rev: current.rev } : {}), records });
}

export async function lastMigration(db: LogDatabase): Promise<MigrationReport | undefined> {
  const doc = await readLocal<StoredDoc & { report?: MigrationReport }>(db, MIGRATION_DOC);
  return doc?.report;
}

const BATCH = 500;

/** Moves the earlier log into `db` once; undefined when there is no earlier log. */
export async function migrateLegacyLog(
  db: LogDatabase,
  legacyName: string,
  options: LegacyOptions = {},
  now: Date = new Date(),
): Promise<JobsResult<MigrationReport | undefined>> {
  const done = await lastMigration(db);
  if (typeof indexedDB === 'undefined' || !(await legacyExists(legacyName))) return succeed(done);
  const opened = await openLegacy(legacyName, options);
  if (!opened.ok) return opened;
  const legacy = opened.value;
  try {
    const raws = (await legacy.getAll(JOBS_STORE)) as unknown[];
    const at = now.toISOString();
    const valid: StoredDoc[] = [];
    const damaged: DamagedRecord[] = [];
    for (const [index, raw] of raws.entries()) {
      const parsed = v.safeParse(JobSchema, raw);
      if (parsed.success) valid.push(docOfJob(parsed.output) as unknown as StoredDoc);
      else {
        const id = typeof raw === 'object' && raw !== null && 'id' in raw ? String(raw.id) : `#${index + 1}`;
        damaged.push({ key: id, raw, issues: issuesOf(parsed.issues), source: 'migration', at });
      }
    }
    // A move cut short earlier left some jobs behind already: those are not written twice.
    const present = new Set<string>();
    for (let i = 0; i < valid.length; i += BATCH) {
      const keys = valid.slice(i, i + BATCH).map((doc) => doc._id);
      const { rows } = await db.allDocs({ keys });
      for (const row of rows) if (!row.error && !row.value.deleted) present.add(row.id);
    }
    const toWrite = valid.filter((doc) => !present.has(doc._id));
    for (let i = 0; i < toWrite.length; i += BATCH) {
      const results = await db.bulkDocs(toWrite.slice(i, i + BATCH));
      const failed = results.find((r) => r.error);
      if (failed) return storageFailure(failed);
    }
    const kept = await damagedRecords(db);
    const keys = new Set(damaged.map((d) => d.key));
    if (damaged.length > 0) await saveDamaged(db, [...kept.records.filter((d) => !keys.has(d.key)), ...damaged]);

    // Every job found again as it was written (one changed since, after a cut-short move, counts as found).
    let found = 0;
    const written = new Set(toWrite.map((doc) => doc._id));
    for (let i = 0; i < valid.length; i += BATCH) {
      const batch = valid.slice(i, i + BATCH);
      const { rows } = await db.allDocs({ keys: batch.map((doc) => doc._id), include_docs: true });
      rows.forEach((row, j) => {
        const doc = row.doc;
        if (!doc || row.error) return;
        if (!written.has(row.id) || sameValue(doc.job, batch[j]!.job)) found++;
      });
    }
    const keptNow = new Set((await damagedRecords(db)).records.map((d) => d.key));
    const damagedFound = damaged.filter((d) => keptNow.has(d.key)).length;
    const report: MigrationReport = {
      total: raws.length,
      moved: found,
      damaged: damagedFound,
      verified: found === valid.length && damagedFound === damaged.length && found + damagedFound === raws.length,
      at,
    };
    if (report.verified) {
      const marker = await readLocal<StoredDoc>(db, MIGRATION_DOC);
      await db.put({ _id: MIGRATION_DOC, ...(marker?._rev ? { _rev: marker._rev } : {}), report });
      legacy.close();
      await new Promise<void>((resolve) => {
        const request = indexedDB.deleteDatabase(legacyName);
        request.onsuccess = () => resolve();
        request.onerror = () => resolve();
        request.onblocked = () => resolve();
      });
    }
    return succeed(report);
  } catch (error) {
    return storageFailure(error);
  } finally {
    legacy.close();
  }
}
