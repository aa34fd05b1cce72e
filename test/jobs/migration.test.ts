import { openDB } from 'idb';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { JOBS_STORE, LATEST_DB_VERSION, runMigrations } from '../../src/jobs/migrations';
import { jobFromV1, type JobV1 } from '../../src/jobs/migrations/v1';
import { JOB_RECORD_VERSION } from '../../src/jobs/schema';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import { openJobStore } from '../../src/jobs/store';
import { memoryPouch, withWrites } from '../memoryPouch';
import { uniqueDbName, unwrap } from './helpers';

/** Opens the new log on a fresh database, moving in the earlier log named `legacyName`. */
const openMoving = (legacyName: string, extra: Partial<Parameters<typeof openJobStore>[0]> = {}) =>
  openJobStore({ name: uniqueDbName(), pouch: memoryPouch, legacyName, ...extra });

/** Whether an IndexedDB database of that name still exists. */
async function exists(name: string): Promise<boolean> {
  return (await indexedDB.databases()).some((db) => db.name === name);
}

const COMPOSITION_8620 = { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 };

/** Records as the first release wrote them (demo plant). */
const V1_FIXTURES: JobV1[] = [
  {
    id: '0b7f3c1e-2a4d-4e5f-8a9b-1c2d3e4f5a6b',
    createdAt: '2025-01-14T05:12:00.000Z',
    updatedAt: '2025-01-14T06:40:00.000Z',
    shift: 'C',
    shiftDate: '2025-01-13',
    initials: 'MK',
    furnace: 'F1',
    workOrder: 'WO-024101',
    part: 'KR-2231',
    grade: 'sae-8620',
    request: {
      mode: 'depth',
      temperatureC: 925,
      timeH: 6.5,
      carbonPotentialPct: 0.9,
      coreCarbonPct: 0.2,
      composition: COMPOSITION_8620,
    },
    predictedEcdMm: 0.88,
    predictedTotalCaseMm: 1.32,
    predictedSurfaceCarbonPct: 0.84,
    model: 'agren',
    appVersion: '0.0.9',
    status: 'in-furnace',
    notes: 'Coupon in basket 3.',
  },
  {
    id: '1c8e4d2f-3b5e-4f60-9bac-2d3e4f5a6b7c',
    createdAt: '2025-01-15T09:00:00.000Z',
    updatedAt: '2025-01-16T11:30:00.000Z',
    shift: 'A',
    shiftDate: '2025-01-15',
    initials: 'JR',
    furnace: 'F3',
    workOrder: '',
    part: 'KR-0907',
    grade: '16MnCr5 mill cert 4471',
    request: {
      mode: 'time',
      temperatureC: 900,
      targetDepthMm: 0.32,
      surfaceCarbonPct: 0.8,
      coreCarbonPct: 0.16,
      model: 'tibbetts',
    },
    predictedEcdMm: 0.32,
    predictedTotalCaseMm: 0.51,
    predictedSurfaceCarbonPct: 0.8,
    model: 'tibbetts',
    appVersion: '0.0.9',
    status: 'on-hold',
    labEcdMm: 0.29,
    notes: '=HYPERLINK("x") — «Prüfung» ñ',
  },
  {
    id: '2d9f5e30-4c6f-4071-acbd-3e4f5a6b7c8d',
    createdAt: '2025-01-20T15:45:00.000Z',
    updatedAt: '2025-01-22T08:00:00.000Z',
    shift: 'B',
    shiftDate: '2025-01-20',
    initials: 'AL',
    furnace: 'F2',
    workOrder: 'WO-024155',
    part: 'KR-4410',
    grade: '20mncr5',
    request: { mode: 'temperature', timeH: 12, targetDepthMm: 1.35, carbonPotentialPct: 0.9, coreCarbonPct: 0.2 },
    predictedEcdMm: 1.35,
    predictedTotalCaseMm: 2.01,
    predictedSurfaceCarbonPct: 0.82,
    model: 'agren',
    appVersion: '0.0.9',
    status: 'done',
    labEcdMm: 1.28,
    notes: '',
  },
  {
    id: '3ea06f41-5d70-4182-bdce-4f5a6b7c8d9e',
    createdAt: '2025-01-21T23:10:00.000Z',
    updatedAt: '2025-01-21T23:10:00.000Z',
    shift: 'C',
    shiftDate: '2025-01-21',
    initials: 'LS',
    furnace: 'F1',
    workOrder: 'WO-024160',
    part: 'KR-2231',
    grade: 'sae-8620',
    request: { mode: 'depth', temperatureC: 930, timeH: 6, carbonPotentialPct: 0.9, coreCarbonPct: 0.2 },
    predictedEcdMm: 0.86,
    predictedTotalCaseMm: 1.3,
    predictedSurfaceCarbonPct: 0.9,
    model: 'agren',
    appVersion: '0.0.9',
    status: 'rejected',
    notes: 'Door seal leak.\nLoad scrapped.',
  },
];

/** A v1 record the first release let through that version 2 cannot accept (initials too long). */
const V1_UNCONVERTIBLE = { ...V1_FIXTURES[0]!, id: '4fb17052-6e81-4293-8edf-5a6b7c8d9eaf', initials: 'MKJRX' };

/** Writes a database exactly as version 1 of the app did. */
async function writeV1Database(name: string, records: readonly unknown[]): Promise<void> {
  const db = await openDB(name, 1, { upgrade: (d, oldVersion, _n, tx) => void runMigrations(d, tx, oldVersion, 1) });
  for (const record of records) await db.put(JOBS_STORE, record);
  db.close();
}

afterEach(() => vi.restoreAllMocks());

describe('the earlier log (IndexedDB, version 1 → 2) moved into the new one', () => {
  it('the record version and the earlier database version agree', () => {
    expect(LATEST_DB_VERSION).toBe(JOB_RECORD_VERSION);
  });

  it('migrates every v1 fixture without loss: each v1 value is found at its v2 place', async () => {
    const name = uniqueDbName();
    await writeV1Database(name, V1_FIXTURES);
    const store = unwrap(await openMoving(name));
    const { jobs, corrupt } = unwrap(await store.readAll());
    expect(corrupt).toEqual([]);
    expect(store.migration).toMatchObject({ total: 4, moved: 4, damaged: 0, verified: true });
    expect(jobs).toHaveLength(V1_FIXTURES.length);
    for (const old of V1_FIXTURES) {
      const job = unwrap(await store.get(old.id));
      expect(job).toMatchObject({
        id: old.id,
        createdAt: old.createdAt,
        updatedAt: old.updatedAt,
        shift: old.shift,
        shiftDate: old.shiftDate,
        operator: old.initials,
        furnace: old.furnace,
        workOrder: old.workOrder,
        partNumber: old.part,
        notes: old.notes,
        prediction: {
          effectiveCaseDepthMm: old.predictedEcdMm,
          totalCaseDepthMm: old.predictedTotalCaseMm,
          surfaceCarbonPct: old.predictedSurfaceCarbonPct,
          model: old.model,
          appVersion: old.appVersion,
        },
      });
      const { mode, ...request } = old.request;
      expect(job.inputs).toEqual({ kind: mode, ...request });
      expect(job.steel.coreCarbonPct).toBe(old.request.coreCarbonPct);
      expect(job.steel.composition).toEqual(old.request.composition);
      expect(job.lab).toEqual(old.labEcdMm === undefined ? undefined : { ecdMm: old.labEcdMm });
    }
    store.close();
  });

  it('maps statuses to the new spelling and grades to id + name (free names kept as written)', async () => {
    const name = uniqueDbName();
    await writeV1Database(name, V1_FIXTURES);
    const store = unwrap(await openMoving(name));
    const byId = Object.fromEntries(unwrap(await store.readAll()).jobs.map((j) => [j.id, j]));
    expect(V1_FIXTURES.map((f) => byId[f.id]!.status)).toEqual(['inFurnace', 'onHold', 'done', 'rejected']);
    expect(byId[V1_FIXTURES[0]!.id]!.steel).toEqual({
      gradeId: 'sae-8620',
      gradeName: 'SAE 8620',
      coreCarbonPct: 0.2,
      composition: COMPOSITION_8620,
    });
    expect(byId[V1_FIXTURES[1]!.id]!.steel).toEqual({ gradeName: '16MnCr5 mill cert 4471', coreCarbonPct: 0.16 });
    expect(byId[V1_FIXTURES[2]!.id]!.steel).toEqual({ gradeId: '20mncr5', gradeName: '20MnCr5', coreCarbonPct: 0.2 });
    store.close();
  });

  it('the filters find moved records; the old database is deleted once every record was found again', async () => {
    const name = uniqueDbName();
    await writeV1Database(name, V1_FIXTURES);
    const store = unwrap(await openMoving(name));
    expect(unwrap(await store.list({ status: 'onHold' })).jobs.map((j) => j.id)).toEqual([V1_FIXTURES[1]!.id]);
    expect(unwrap(await store.list({ partNumber: 'KR-2231' })).jobs).toHaveLength(2);
    expect(
      unwrap(await store.list({ furnace: 'F1', fromDate: '2025-01-21', toDate: '2025-01-31' })).jobs.map((j) => j.id),
    ).toEqual([V1_FIXTURES[3]!.id]);
    expect(await exists(name)).toBe(false);
    store.close();
  });

  it('a v1 record that cannot convert is kept aside as damaged with its reason, exportable and deletable', async () => {
    const name = uniqueDbName();
    await writeV1Database(name, [...V1_FIXTURES, V1_UNCONVERTIBLE]);
    const store = unwrap(await openMoving(name));
    expect(store.migration).toMatchObject({ total: 5, moved: 4, damaged: 1, verified: true });
    const { jobs, corrupt } = unwrap(await store.readAll());
    expect(jobs).toHaveLength(V1_FIXTURES.length);
    // Still in its version 1 shape: the problems name the fields version 2 expects.
    expect(corrupt).toEqual([
      {
        key: V1_UNCONVERTIBLE.id,
        issues: expect.arrayContaining([expect.objectContaining({ path: 'operator', problem: 'missing' })]),
        source: 'migration',
      },
    ]);
    const exported = unwrap(await store.damagedExport());
    expect(exported).toHaveLength(1);
    expect(exported[0]!.raw).toEqual(V1_UNCONVERTIBLE);
    unwrap(await store.deleteDamaged(V1_UNCONVERTIBLE.id));
    expect(unwrap(await store.readAll()).corrupt).toEqual([]);
    expect((await store.deleteDamaged(V1_UNCONVERTIBLE.id)).ok).toBe(false);
    store.close();
  });

  it('1 000 version-2 records with 40 damaged: all counted, none twice after a move cut short, old log kept until then', async () => {
    const name = uniqueDbName();
    const jobs = demoJobs({ count: 1000, end: new Date('2025-06-30T12:00:00Z'), seed: 9 });
    const records: Record<string, unknown>[] = jobs.map((job, i) => (i % 25 === 3 ? { ...job, operator: 42 } : job));
    const db = await openDB(name, 2, { upgrade: (d, old, _n, tx) => void runMigrations(d, tx, old, 2) });
    for (const record of records) await db.put(JOBS_STORE, record);
    db.close();
    // The first attempt stops after the first batch (as a tab closed mid-way would): nothing is lost.
    const pouchName = uniqueDbName();
    let writes = 0;
    const cutShort = (dbName: string) => {
      const real = memoryPouch(dbName);
      return withWrites(real, {
        bulkDocs: (docs, options) =>
          ++writes === 2 ? Promise.reject(new DOMException('gone', 'AbortError')) : real.bulkDocs(docs, options),
      });
    };
    const first = await openJobStore({ name: pouchName, pouch: cutShort, legacyName: name });
    expect(first.ok).toBe(false);
    expect(await exists(name)).toBe(true);
    const store = unwrap(await openJobStore({ name: pouchName, pouch: memoryPouch, legacyName: name }));
    expect(store.migration).toMatchObject({ total: 1000, moved: 960, damaged: 40, verified: true });
    const all = unwrap(await store.readAll());
    expect(all.jobs).toHaveLength(960);
    expect(new Set(all.jobs.map((j) => j.id)).size).toBe(960);
    expect(all.corrupt).toHaveLength(40);
    expect(all.corrupt.every((c) => c.issues[0]?.path === 'operator')).toBe(true);
    expect(await exists(name)).toBe(false);
    store.close();
  });

  it('an upgrade that fails part-way is rolled back: still version 1, every record untouched', async () => {
    const name = uniqueDbName();
    await writeV1Database(name, V1_FIXTURES);
    let updates = 0;
    const original = IDBCursor.prototype.update;
    vi.spyOn(IDBCursor.prototype, 'update').mockImplementation(function (this: IDBCursor, value: unknown) {
      if (++updates === 3) throw new DOMException('simulated failure', 'UnknownError');
      return original.call(this, value);
    });
    const result = await openMoving(name);
    expect(result.ok).toBe(false);
    vi.restoreAllMocks();
    const raw = await openDB(name);
    expect(raw.version).toBe(1);
    const stored = await raw.getAll(JOBS_STORE);
    expect(stored.sort((a, b) => (a.id < b.id ? -1 : 1))).toEqual(V1_FIXTURES);
    raw.close();
    // Once the fault is gone the upgrade runs normally.
    const store = unwrap(await openMoving(name));
    expect(unwrap(await store.readAll()).jobs).toHaveLength(V1_FIXTURES.length);
    store.close();
  });

  it('a tab still on version 1 is told it blocks; the upgrade proceeds once it closes', async () => {
    const name = uniqueDbName();
    await writeV1Database(name, V1_FIXTURES);
    const oldTab = await openDB(name, 1);
    const blocked = vi.fn(() => oldTab.close());
    const store = unwrap(await openMoving(name, { onBlocked: blocked }));
    expect(blocked).toHaveBeenCalled();
    expect(unwrap(await store.count())).toBe(V1_FIXTURES.length);
    store.close();
  });
});

describe('jobFromV1 (pure conversion)', () => {
  it('refuses a record without a request, naming it', () => {
    expect(jobFromV1({ id: 'x' })).toEqual({ ok: false, issues: [{ path: 'request', problem: 'missing' }] });
  });
  it('drops no defined field: an unknown v1 status is kept and reported', () => {
    const result = jobFromV1({ ...V1_FIXTURES[0], status: 'lost' });
    expect(result.ok ? null : result.issues[0]).toMatchObject({ path: 'status', problem: 'notOneOf' });
  });
});
