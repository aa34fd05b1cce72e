/**
 * A full disk part-way through a write must leave the log exactly as it was and say so with
 * storage.full. The fault is injected into the Nth put/add of the transaction, in the three
 * ways browsers report it: the request fails (its error event aborts the transaction), the call
 * throws, or the transaction aborts after the request succeeded (as on commit).
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { backupToJson, createBackup } from '../../src/jobs/backup';
import type { Job } from '../../src/jobs/schema';
import type { JobStore } from '../../src/jobs/store';
import { importBackup } from '../../src/jobs/transfer';
import { freshStore, pinionDraft, snapshot, unwrap } from './helpers';

type Fault = 'requestFails' | 'callThrows' | 'transactionAborts';
const FAULTS: Fault[] = ['requestFails', 'callThrows', 'transactionAborts'];

/** fake-indexeddb's transaction internals, used only to fail a request as a browser would. */
interface FakeTransactionInternals {
  _execRequestAsync(job: { operation: () => unknown; source: unknown }): IDBRequest;
  _abort(errorName: string): void;
}

function failNth(method: 'put' | 'add', n: number, fault: Fault): void {
  let calls = 0;
  const original = IDBObjectStore.prototype[method] as (this: IDBObjectStore, ...args: unknown[]) => IDBRequest;
  vi.spyOn(IDBObjectStore.prototype, method).mockImplementation(function (this: IDBObjectStore, ...args: unknown[]) {
    if (++calls !== n) return original.apply(this, args);
    const quota = new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    const tx = this.transaction as unknown as FakeTransactionInternals;
    if (fault === 'callThrows') throw quota;
    if (fault === 'requestFails') {
      return tx._execRequestAsync({
        operation: () => {
          throw quota;
        },
        source: this,
      }) as IDBRequest<IDBValidKey>;
    }
    const request = original.apply(this, args);
    request.addEventListener('success', () => tx._abort('QuotaExceededError'));
    return request as IDBRequest<IDBValidKey>;
  });
}

afterEach(() => vi.restoreAllMocks());

async function storeWithThreeJobs(): Promise<{ store: JobStore; jobs: Job[] }> {
  const store = await freshStore();
  const jobs: Job[] = [];
  for (const furnace of ['F1', 'F2', 'F3']) jobs.push(unwrap(await store.add(pinionDraft({ furnace }))));
  return { store, jobs };
}

const newJob = (base: Job, i: number): Job => ({ ...base, id: crypto.randomUUID(), workOrder: `WO-NEW-${i}` });

const FULL = { ok: false, error: { code: 'storage.full' } };

/** Runs `failingWrites` on a log of three jobs with the fault armed, then checks nothing changed. */
async function expectUnchangedAfter(failingWrites: (store: JobStore, jobs: Job[]) => Promise<void>): Promise<void> {
  const { store, jobs } = await storeWithThreeJobs();
  const before = await snapshot(store);
  await failingWrites(store, jobs);
  vi.restoreAllMocks();
  expect(await snapshot(store)).toEqual(before);
  store.close();
}

describe.each(FAULTS)('storage full (%s): nothing half-written', (fault) => {
  it('putMany of five, failing at the third: storage.full and every record as before', () =>
    expectUnchangedAfter(async (store, jobs) => {
      const edited = { ...jobs[0]!, notes: 'changed in the failed batch' };
      failNth('put', 3, fault);
      const batch = [edited, newJob(jobs[0]!, 1), newJob(jobs[0]!, 2), newJob(jobs[0]!, 3), newJob(jobs[0]!, 4)];
      expect(await store.putMany(batch)).toEqual(FULL);
    }));

  it('an import failing part-way: storage.full and the log unchanged', () =>
    expectUnchangedAfter(async (store, jobs) => {
      const newer = { ...jobs[1]!, status: 'done' as const, updatedAt: '2099-01-01T00:00:00.000Z' };
      const file = backupToJson(
        createBackup([newer, newJob(jobs[1]!, 1), newJob(jobs[1]!, 2), newJob(jobs[1]!, 3)], 'test'),
      );
      failNth('put', 3, fault);
      expect(await importBackup(store, file)).toEqual(FULL);
    }));

  it('add and update: storage.full and no change', () =>
    expectUnchangedAfter(async (store, jobs) => {
      failNth('add', 1, fault);
      expect(await store.add(pinionDraft())).toEqual(FULL);
      failNth('put', 1, fault);
      expect(await store.update(jobs[2]!.id, { status: 'inFurnace' })).toEqual(FULL);
    }));
});

describe('after a full-disk failure', () => {
  it('the same write succeeds once space is back', async () => {
    const { store, jobs } = await storeWithThreeJobs();
    failNth('put', 1, 'requestFails');
    expect((await store.update(jobs[0]!.id, { status: 'done' })).ok).toBe(false);
    vi.restoreAllMocks();
    expect(unwrap(await store.update(jobs[0]!.id, { status: 'done' })).status).toBe('done');
    store.close();
  });

  it('other storage failures are reported by name, not as full', async () => {
    const { store, jobs } = await storeWithThreeJobs();
    vi.spyOn(IDBObjectStore.prototype, 'put').mockImplementation(() => {
      throw new DOMException('disk error', 'UnknownError');
    });
    expect(await store.update(jobs[0]!.id, { notes: 'x' })).toEqual({
      ok: false,
      error: { code: 'storage.failed', params: { name: 'UnknownError' } },
    });
    store.close();
  });
});
