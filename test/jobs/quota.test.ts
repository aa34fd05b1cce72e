/**
 * A full disk must be reported as storage.full with nothing half-written. PouchDB's IndexedDB
 * adapter writes each call in one transaction and reports a full disk as its own error whose
 * `reason` is the browser's `QuotaExceededError`; the fault is injected here at that boundary, on
 * the database's write calls (the browser's own behaviour is covered by the browser test with
 * Chromium's quota override).
 */
import { describe, expect, it } from 'vitest';
import { backupToJson, createBackup } from '../../src/jobs/backup';
import type { LogDatabase } from '../../src/jobs/pouch';
import type { Job } from '../../src/jobs/schema';
import { openJobStore, type JobStore } from '../../src/jobs/store';
import { importBackup } from '../../src/jobs/transfer';
import { memoryPouch, withWrites } from '../memoryPouch';
import { pinionDraft, snapshot, uniqueDbName, unwrap } from './helpers';

/** As PouchDB's IndexedDB adapter reports an aborted transaction. */
const quotaError = () =>
  Object.assign(new Error('QuotaExceededError'), {
    status: 500,
    name: 'indexed_db_went_bad',
    reason: 'QuotaExceededError',
  });

interface Faults {
  /** The error the next writes fail with; undefined: writes work. */
  next?: () => Error;
}

async function storeWithFaults(): Promise<{ store: JobStore; faults: Faults; jobs: Job[] }> {
  const faults: Faults = {};
  const pouch = (name: string): LogDatabase => {
    const db = memoryPouch(name);
    return withWrites(db, {
      put: (doc) => (faults.next ? Promise.reject(faults.next()) : db.put(doc)),
      bulkDocs: (docs, options) => (faults.next ? Promise.reject(faults.next()) : db.bulkDocs(docs, options)),
    });
  };
  const store = unwrap(await openJobStore({ name: uniqueDbName(), pouch, legacyName: false }));
  const jobs: Job[] = [];
  for (const furnace of ['F1', 'F2', 'F3']) jobs.push(unwrap(await store.add(pinionDraft({ furnace }))));
  return { store, faults, jobs };
}

const newJob = (base: Job, i: number): Job => ({ ...base, id: crypto.randomUUID(), workOrder: `WO-NEW-${i}` });

const FULL = { ok: false, error: { code: 'storage.full' } };

describe('storage full: nothing half-written, said in words', () => {
  it('putMany, an import, an add and an edit: storage.full and every record as before', async () => {
    const { store, faults, jobs } = await storeWithFaults();
    const before = await snapshot(store);
    faults.next = quotaError;
    const edited = { ...jobs[0]!, notes: 'changed in the failed batch' };
    expect(await store.putMany([edited, newJob(jobs[0]!, 1), newJob(jobs[0]!, 2)])).toEqual(FULL);
    const newer = { ...jobs[1]!, status: 'done' as const };
    const file = backupToJson(createBackup([newer, newJob(jobs[1]!, 1), newJob(jobs[1]!, 2)], 'test'));
    expect(await importBackup(store, file)).toEqual(FULL);
    expect(await store.add(pinionDraft())).toEqual(FULL);
    expect(await store.update(jobs[2]!.id, { status: 'inFurnace' })).toEqual(FULL);
    faults.next = undefined;
    expect(await snapshot(store)).toEqual(before);
    store.close();
  });

  it('the same write succeeds once space is back', async () => {
    const { store, faults, jobs } = await storeWithFaults();
    faults.next = quotaError;
    expect((await store.update(jobs[0]!.id, { status: 'done' })).ok).toBe(false);
    faults.next = undefined;
    expect(unwrap(await store.update(jobs[0]!.id, { status: 'done' })).status).toBe('done');
    store.close();
  });

  it('other storage failures are reported by name, not as full', async () => {
    const { store, faults, jobs } = await storeWithFaults();
    faults.next = () => new DOMException('disk error', 'UnknownError');
    expect(await store.update(jobs[0]!.id, { notes: 'x' })).toEqual({
      ok: false,
      error: { code: 'storage.failed', params: { name: 'UnknownError' } },
    });
    store.close();
  });
});
