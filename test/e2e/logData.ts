/**
 * Job-log data for the browser tests: a backup of the demo plant's log (invented, DOMAIN
 * scenario) whose newest jobs fall in the shift running now, so the log opens on them; and
 * reading the browser's database as it is stored.
 */
import type { Page } from 'playwright-core';
import { backupToJson, createBackup } from '../../src/jobs/backup';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import type { Job } from '../../src/jobs/schema';
import { DEFAULT_SHIFT_CONFIG, shiftOf } from '../../src/jobs/shift';

export const DB_NAME = 'casefront-job-log';

/** Moves a job to `createdMs` (and its shift with it), keeping it valid. */
export function movedTo(job: Job, createdMs: number): Job {
  const created = new Date(createdMs);
  return {
    ...job,
    createdAt: created.toISOString(),
    updatedAt: new Date(Math.max(createdMs, Date.parse(job.updatedAt))).toISOString(),
    ...shiftOf(created, DEFAULT_SHIFT_CONFIG),
  };
}

/**
 * `count` demo jobs over the last year. `inShift` of them are put into the current shift,
 * 20 min apart: the newest ones, except that `withLab` are taken from jobs the lab measured.
 */
export function demoLog(count: number, inShift: number, withLab = 0, now = new Date()): Job[] {
  const jobs = demoJobs({ count, end: now, seed: 4410, appVersion: '0.1.0' });
  const measured = jobs.filter((j) => j.lab?.ecdMm !== undefined).slice(-withLab);
  const newest = jobs.filter((j) => !measured.includes(j)).slice(-(inShift - measured.length));
  const chosen = new Set([...measured, ...newest]);
  const { shiftDate, shift } = shiftOf(now, DEFAULT_SHIFT_CONFIG);
  let placed = 0;
  return jobs.map((job) => {
    if (!chosen.has(job)) return job;
    // Back from now, 20 min apart; a shift that has only just begun gets them all at now.
    const candidate = movedTo(job, now.getTime() - placed++ * 20 * 60_000);
    return candidate.shift === shift && candidate.shiftDate === shiftDate ? candidate : movedTo(job, now.getTime());
  });
}

export function backupText(jobs: readonly Job[]): string {
  return backupToJson(createBackup(jobs, '0.1.0'));
}

/** Picks a backup file in the log's import control, as a person would. */
export async function importFile(page: Page, text: string, name = 'casefront-job-log.json'): Promise<string> {
  await page.goto(`${new URL(page.url()).origin}/#/log/files`);
  await page.waitForSelector('#files-import-input');
  await page.setInputFiles('#files-import-input', { name, mimeType: 'application/json', buffer: Buffer.from(text) });
  const report = page.locator('section[aria-labelledby="files-import"] [aria-live] p');
  await report.waitFor();
  return (await report.textContent()) ?? '';
}

/** Every record in the browser's job log, exactly as stored, sorted by id. */
export function storedRecords(page: Page): Promise<Record<string, unknown>[]> {
  return page.evaluate(
    (name) =>
      new Promise<Record<string, unknown>[]>((resolve, reject) => {
        const open = indexedDB.open(name);
        let absent = false;
        // No log yet: do not create an empty database that the app would then have to upgrade.
        open.onupgradeneeded = () => {
          absent = true;
          open.transaction?.abort();
        };
        open.onerror = () => (absent ? resolve([]) : reject(open.error ?? new Error('the log did not open')));
        open.onsuccess = () => {
          const db = open.result;
          if (!db.objectStoreNames.contains('jobs')) {
            db.close();
            resolve([]);
            return;
          }
          const all = db.transaction('jobs').objectStore('jobs').getAll();
          all.onsuccess = () => {
            db.close();
            resolve((all.result as Record<string, unknown>[]).sort((a, b) => (String(a.id) < String(b.id) ? -1 : 1)));
          };
          all.onerror = () => reject(all.error ?? new Error('the log could not be read'));
        };
      }),
    DB_NAME,
  );
}

/** Deletes the job log's database (the app closes its connection when asked). */
export function wipeLog(page: Page): Promise<void> {
  return page.evaluate(
    (name) =>
      new Promise<void>((resolve, reject) => {
        const request = indexedDB.deleteDatabase(name);
        request.onsuccess = () => resolve();
        request.onerror = () => reject(request.error ?? new Error('the log could not be deleted'));
      }),
    DB_NAME,
  );
}
