/**
 * Job log at a busy shop's year: 10 000 jobs in the document database (Node: PouchDB's in-memory
 * adapter; the browser uses IndexedDB). Targets: a filtered list (a month of one furnace and one
 * status, plus a text search) ≤ 50 ms (`logFilterMs`); a text search over all jobs ≤ 50 ms
 * (`logSearchMs`); CSV export (`logCsvExportMs`) and JSON backup (`logBackupMs`) of all ≤ 500 ms.
 */
import { performance } from 'node:perf_hooks';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import { openJobStore } from '../../src/jobs/store';
import { memoryPouch } from '../memoryPouch';
import { exportBackup, exportCsv } from '../../src/jobs/transfer';
import { medianMs } from './timing';

const JOB_COUNT = 10_000;
const END = new Date('2025-06-30T12:00:00.000Z');

export async function run(): Promise<Record<string, number>> {
  const opened = await openJobStore({ name: `bench-${Date.now()}`, pouch: memoryPouch, legacyName: false });
  if (!opened.ok) throw new Error(`cannot open the store: ${opened.error.code}`);
  const store = opened.value;

  let start = performance.now();
  const jobs = demoJobs({ count: JOB_COUNT, end: END, seed: 2231 });
  const generateMs = performance.now() - start;
  start = performance.now();
  const saved = await store.putMany(jobs);
  if (!saved.ok || saved.value !== JOB_COUNT) throw new Error('seeding failed');
  console.log(
    `seed: ${JOB_COUNT} demo jobs generated in ${generateMs.toFixed(0)} ms, stored in ${(performance.now() - start).toFixed(0)} ms`,
  );

  const filter = {
    fromDate: '2025-03-01',
    toDate: '2025-03-31',
    furnace: 'F1',
    status: 'done' as const,
    text: 'coupon',
  };
  const filtered = await store.list(filter);
  if (!filtered.ok) throw new Error('filter failed');
  const logFilterMs = await medianMs(() => store.list(filter), 30, 5);
  console.log(
    `filter (F1, March, done, "coupon"): ${filtered.value.jobs.length} jobs, median ${logFilterMs.toFixed(1)} ms over 30 runs (target ≤ 50 ms)`,
  );

  const shiftFilter = { fromDate: '2025-06-30', toDate: '2025-06-30', shift: 'A' as const };
  const shiftListMs = await medianMs(() => store.list(shiftFilter), 30, 5);
  console.log(`current-shift list: median ${shiftListMs.toFixed(1)} ms`);

  const logSearchMs = await medianMs(() => store.list({ text: 'WO-0245' }), 10, 2);
  console.log(`text search over all ${JOB_COUNT}: median ${logSearchMs.toFixed(1)} ms (target ≤ 50 ms)`);

  const csv = await exportCsv(store);
  if (!csv.ok || csv.value.jobCount !== JOB_COUNT) throw new Error('CSV export failed');
  const logCsvExportMs = await medianMs(() => exportCsv(store), 7, 2);
  console.log(
    `CSV export of ${JOB_COUNT} jobs (${(csv.value.text.length / 1e6).toFixed(1)} MB): median ${logCsvExportMs.toFixed(0)} ms over 7 runs (target ≤ 500 ms)`,
  );

  const backup = await exportBackup(store, 'bench', END);
  if (!backup.ok) throw new Error('backup failed');
  const logBackupMs = await medianMs(() => exportBackup(store, 'bench', END), 5, 1);
  console.log(
    `JSON backup of ${JOB_COUNT} jobs (${(backup.value.text.length / 1e6).toFixed(1)} MB): median ${logBackupMs.toFixed(0)} ms (target ≤ 500 ms)`,
  );

  store.close();
  return { logFilterMs, logSearchMs, logCsvExportMs, logBackupMs };
}
