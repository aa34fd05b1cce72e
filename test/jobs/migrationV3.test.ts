/**
 * Record version 2 → 3: a cycle recipe may carry the furnace's diffusivity factor. Every version-2
 * record keeps every field at its place (the upgrade and a version-2 backup file alike), and a
 * record version 3 refuses stays stored as it was and is reported, never dropped.
 */
import { openDB } from 'idb';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import { createBackup, parseBackup } from '../../src/jobs/backup';
import { JOBS_STORE, LATEST_DB_VERSION, runMigrations } from '../../src/jobs/migrations';
import { jobFromV2 } from '../../src/jobs/migrations/v2';
import { JOB_RECORD_VERSION, type Job } from '../../src/jobs/schema';
import { openJobStore } from '../../src/jobs/store';
import { memoryPouch } from '../memoryPouch';
import { uniqueDbName, unwrap } from './helpers';

/** Opens the log on a fresh database, moving in the earlier IndexedDB log named `legacyName`. */
const openMoving = (legacyName: string) => openJobStore({ name: uniqueDbName(), pouch: memoryPouch, legacyName });

const END = new Date('2025-06-30T12:00:00.000Z');
const example = (file: string) =>
  JSON.parse(readFileSync(`public/examples/${file}`, 'utf8')) as Record<string, unknown>;

/** A cycle job as version 2 stored it: the recipe as the cycle screen built it, no factor in it. */
const V2_CYCLE_JOB = {
  id: '5ac28163-7f81-4394-9e0a-6b7c8d9eafb0',
  createdAt: '2025-02-03T07:15:00.000Z',
  updatedAt: '2025-02-04T10:02:00.000Z',
  shift: 'A',
  shiftDate: '2025-02-03',
  operator: 'JR',
  furnace: 'F1',
  workOrder: 'WO-024201',
  partNumber: 'KR-2231',
  steel: { gradeId: 'sae-8620', gradeName: 'SAE 8620', coreCarbonPct: 0.2 },
  inputs: {
    kind: 'cycle',
    recipe: {
      name: 'KR-2231 boost/diffuse',
      steel: { grade: 'sae-8620', coreCarbonPct: 0.2, composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 } },
      model: 'agren',
      thresholdCarbonPct: 0.4,
      ecdHardnessLimit: { value: 550, unit: 'HV' },
      totalCaseMarginPct: 0.05,
      shape: { kind: 'bar', diameterMm: 40 },
      steps: [
        { label: 'boost', durationH: 3.5, startTempC: 925, endTempC: 925, carbonPotentialPct: 1.1, betaMPerS: 1.5e-7 },
        { durationH: 2, startTempC: 925, endTempC: 925, carbonPotentialPct: 0.8, betaMPerS: 1.5e-7 },
        { durationH: 0.5, startTempC: 925, endTempC: 845, carbonPotentialPct: null, betaMPerS: 1.5e-7 },
      ],
    },
  },
  prediction: {
    effectiveCaseDepthMm: 0.93,
    totalCaseDepthMm: 1.52,
    surfaceCarbonPct: 0.83,
    model: 'agren',
    timeH: 6,
    appVersion: '0.1.0',
  },
  status: 'done',
  lab: {
    ecdMm: 0.97,
    surfaceHardness: { value: 61, unit: 'HRC' },
    coreHardness: { value: 380, unit: 'HV' },
    measuredAt: '2025-02-04',
    by: 'Lab 2',
  },
  notes: 'Coupon 4 «ñ» =SUM(A1)',
};

/** A depth job planned on a calibrated furnace (version 2 recorded the factor for closed-form requests). */
const V2_CALIBRATED_DEPTH_JOB = {
  ...V2_CYCLE_JOB,
  id: '6bd39274-8092-44a5-af1b-7c8d9eafb0c1',
  inputs: {
    kind: 'depth',
    temperatureC: 930,
    timeH: 6,
    carbonPotentialPct: 0.9,
    coreCarbonPct: 0.2,
    thresholdCarbonPct: 0.4,
    model: 'agren',
    composition: { Si: 0.25, Mn: 0.8, Cr: 0.5, Ni: 0.55, Mo: 0.2 },
    diffusivityFactor: 1.21,
    temperatureToleranceC: 8,
    totalCaseMarginPct: 0.05,
  },
  prediction: { ...V2_CYCLE_JOB.prediction, ecdBandMm: { minMm: 0.88, maxMm: 1.02 } },
};

/** The demo cycle examples as stored cycle jobs (every field the simulator reads). */
const exampleCycleJobs = ['pinion-kr2231-cycle.json', 'pin-kr0907-cycle.json'].map((file, i) => ({
  ...V2_CYCLE_JOB,
  id: `7ce4a385-91a3-45b6-b02c-8d9eafb0c1d${i}`,
  inputs: { kind: 'cycle', recipe: example(file) },
}));

/** Records as the version-2 app stored them: demo jobs of every status and kind, and the cases above. */
const V2_FIXTURES: unknown[] = [
  ...demoJobs({ count: 60, end: END, seed: 7 }),
  V2_CYCLE_JOB,
  V2_CALIBRATED_DEPTH_JOB,
  ...exampleCycleJobs,
];

/** A record the looser version-2 schema let through (temperatures were only finite) that version 3 refuses. */
const V2_OUT_OF_RANGE = {
  ...V2_CALIBRATED_DEPTH_JOB,
  id: '8df5b496-a2b4-46c7-b13d-9eafb0c1d2e3',
  inputs: { ...V2_CALIBRATED_DEPTH_JOB.inputs, temperatureC: 2000 },
};

const byId = (records: readonly unknown[]) =>
  Object.fromEntries(records.map((r) => [(r as { id: string }).id, r])) as Record<string, unknown>;

/** Writes a database exactly as version 2 of the app did. */
async function writeV2Database(name: string, records: readonly unknown[]): Promise<void> {
  const db = await openDB(name, 2, { upgrade: (d, oldVersion, _n, tx) => void runMigrations(d, tx, oldVersion, 2) });
  for (const record of records) await db.put(JOBS_STORE, record);
  db.close();
}

describe('job log database: version 2 → 3', () => {
  it('the record version is 3 and the database follows it', () => {
    expect(JOB_RECORD_VERSION).toBe(3);
    expect(LATEST_DB_VERSION).toBe(JOB_RECORD_VERSION);
  });

  it('every v2 fixture migrates with nothing lost or changed, and reads back the same after a write', async () => {
    const name = uniqueDbName();
    await writeV2Database(name, V2_FIXTURES);
    const store = unwrap(await openMoving(name));
    expect(store.migration).toMatchObject({ total: V2_FIXTURES.length, moved: V2_FIXTURES.length, verified: true });
    const { jobs, corrupt } = unwrap(await store.readAll());
    expect(corrupt).toEqual([]);
    expect(jobs).toHaveLength(V2_FIXTURES.length);
    const kinds = new Set(jobs.map((j) => j.inputs?.kind));
    expect([...kinds].sort()).toEqual(['cycle', 'depth', 'time']);
    expect(byId(jobs)).toEqual(byId(V2_FIXTURES));
    // Round trip: written back as version 3 and read again, still the same.
    unwrap(await store.putMany(jobs));
    expect(byId(unwrap(await store.readAll()).jobs)).toEqual(byId(V2_FIXTURES));
    store.close();
  });

  it('a v2 record version 3 refuses is kept aside as it was and reported, not dropped', async () => {
    const name = uniqueDbName();
    await writeV2Database(name, [...V2_FIXTURES, V2_OUT_OF_RANGE]);
    const store = unwrap(await openMoving(name));
    const { jobs, corrupt } = unwrap(await store.readAll());
    expect(jobs).toHaveLength(V2_FIXTURES.length);
    expect(corrupt.map((c) => c.key)).toEqual([V2_OUT_OF_RANGE.id]);
    const exported = unwrap(await store.damagedExport());
    expect(exported.map((d) => d.raw)).toEqual([V2_OUT_OF_RANGE]);
    store.close();
  });

  it('a version-2 backup file imports with the same jobs; a version-3 file of them reads back equal', () => {
    const v2File = JSON.stringify({ ...createBackup(V2_FIXTURES as Job[], '0.1.0', END), version: 2 });
    const fromV2 = unwrap(parseBackup(v2File));
    expect(fromV2.version).toBe(3);
    expect(byId(fromV2.jobs)).toEqual(byId(V2_FIXTURES));
    const v3File = JSON.stringify(createBackup(fromV2.jobs, '0.1.0', END));
    expect(byId(unwrap(parseBackup(v3File)).jobs)).toEqual(byId(V2_FIXTURES));
  });
});

describe('jobFromV2 (pure conversion)', () => {
  it('gives every fixture back equal, field for field', () => {
    for (const fixture of V2_FIXTURES) {
      const converted = jobFromV2(fixture);
      expect(converted.ok ? converted.job : converted.issues).toEqual(fixture);
    }
  });
  it('reports where a record falls outside version 3, and changes nothing of the input', () => {
    const input = structuredClone(V2_OUT_OF_RANGE);
    const converted = jobFromV2(input);
    expect(converted.ok ? null : converted.issues[0]?.path).toBe('inputs.temperatureC');
    expect(input).toEqual(V2_OUT_OF_RANGE);
  });
  it('a recipe with the furnace factor is version 3 only: accepted now, its factor kept', () => {
    const calibrated = structuredClone(V2_CYCLE_JOB);
    (calibrated.inputs.recipe as Record<string, unknown>).diffusivityFactor = 1.21;
    const converted = jobFromV2(calibrated);
    expect(
      converted.ok && converted.job.inputs?.kind === 'cycle' && converted.job.inputs.recipe.diffusivityFactor,
    ).toBe(1.21);
  });
});
