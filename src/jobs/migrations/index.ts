/**
 * The IndexedDB schema, one migration per version. Each runs inside the browser's
 * version-change transaction, so an upgrade commits whole or not at all.
 *
 * To add version N: append a migration with `version: N` that changes stores, indexes and
 * records (convert records with a pure function kept beside it, as v1.ts does), bump
 * JOB_RECORD_VERSION in schema.ts, and add a test that opens a version N−1 database
 * written from fixtures and checks every record after the upgrade.
 */
import type { IDBPDatabase, IDBPTransaction } from 'idb';
import { jobFromV1 } from './v1';
import { jobFromV2 } from './v2';

export const JOBS_STORE = 'jobs';

/** Index names and their key paths, used by the queries. */
export const INDEX = {
  createdAt: 'byCreatedAt',
  furnace: 'byFurnace',
  shiftDate: 'byShiftDate',
  furnaceShiftDate: 'byFurnaceShiftDate',
  partNumber: 'byPart',
  status: 'byStatus',
  updatedAt: 'byUpdatedAt',
} as const;

export type UpgradeTransaction = IDBPTransaction<unknown, string[], 'versionchange'>;

export interface Migration {
  version: number;
  /** `oldVersion`: the database's version before this upgrade began (0 for a new one). */
  upgrade(db: IDBPDatabase, tx: UpgradeTransaction, oldVersion: number): Promise<void>;
}

export const MIGRATIONS: readonly Migration[] = [
  {
    // The first release: the store, and indexes by creation time and furnace.
    version: 1,
    upgrade(db) {
      const store = db.createObjectStore(JOBS_STORE, { keyPath: 'id' });
      store.createIndex(INDEX.createdAt, 'createdAt');
      store.createIndex(INDEX.furnace, 'furnace');
      return Promise.resolve();
    },
  },
  {
    // Record version 2 (steel, inputs union, prediction, lab results, camelCase statuses)
    // and the indexes behind the log's filters.
    version: 2,
    async upgrade(_db, tx) {
      const store = tx.objectStore(JOBS_STORE);
      store.createIndex(INDEX.shiftDate, 'shiftDate');
      store.createIndex(INDEX.furnaceShiftDate, ['furnace', 'shiftDate']);
      store.createIndex(INDEX.partNumber, 'partNumber');
      store.createIndex(INDEX.status, 'status');
      store.createIndex(INDEX.updatedAt, 'updatedAt');
      for (let cursor = await store.openCursor(); cursor; cursor = await cursor.continue()) {
        const converted = jobFromV1(cursor.value);
        // A record that cannot convert stays as it was: reported on read, never dropped.
        if (converted.ok) await cursor.update(converted.job);
      }
    },
  },
  {
    // Record version 3: a cycle recipe may carry the furnace's diffusivity factor. No index changes;
    // each record is checked and kept as it is.
    version: 3,
    async upgrade(_db, tx, oldVersion) {
      // Records just converted from version 1 are already version 3.
      if (oldVersion < 2) return;
      const store = tx.objectStore(JOBS_STORE);
      for (let cursor = await store.openCursor(); cursor; cursor = await cursor.continue()) {
        const converted = jobFromV2(cursor.value);
        // A record that cannot convert stays as it was: reported on read, never dropped.
        if (converted.ok) await cursor.update(converted.job);
      }
    },
  },
];

export const LATEST_DB_VERSION = MIGRATIONS[MIGRATIONS.length - 1]!.version;

/** Runs the migrations after `oldVersion` up to `targetVersion`, in order. */
export async function runMigrations(
  db: IDBPDatabase,
  tx: UpgradeTransaction,
  oldVersion: number,
  targetVersion: number = LATEST_DB_VERSION,
): Promise<void> {
  for (const migration of MIGRATIONS) {
    if (migration.version > oldVersion && migration.version <= targetVersion)
      await migration.upgrade(db, tx, oldVersion);
  }
}
