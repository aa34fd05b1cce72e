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

/** The earlier log's own IndexedDB database (moved into the document database once). */
export const LEGACY_DB_NAME = 'casefront-job-log';

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

/** The log's database in the browser: PouchDB's IndexedDB adapter names it with its prefix. */
export const POUCH_DB_NAME = '_pouch_casefront-log';

/**
 * Every job document in the browser's log as IndexedDB holds it (the winning revision of each,
 * read from PouchDB's own stores, not through the app), sorted by id.
 */
export function storedDocs(page: Page): Promise<Record<string, unknown>[]> {
  return page.evaluate(
    (name) =>
      new Promise<Record<string, unknown>[]>((resolve, reject) => {
        const open = indexedDB.open(name);
        let absent = false;
        // No log yet: do not create an empty database.
        open.onupgradeneeded = () => {
          absent = true;
          open.transaction?.abort();
        };
        open.onerror = () => (absent ? resolve([]) : reject(open.error ?? new Error('the log did not open')));
        open.onsuccess = () => {
          const db = open.result;
          const tx = db.transaction(['document-store', 'by-sequence']);
          const all = tx.objectStore('document-store').getAll();
          all.onsuccess = () => {
            const metas = (all.result as { id: string; winningRev: string; deletedOrLocal: string }[]).filter(
              (m) => m.deletedOrLocal === '0' && !m.id.startsWith('_design/'),
            );
            const bodies = tx.objectStore('by-sequence').index('_doc_id_rev');
            const docs: Record<string, unknown>[] = [];
            let pending = metas.length;
            if (pending === 0) resolve([]);
            for (const meta of metas) {
              const get = bodies.get(`${meta.id}::${meta.winningRev}`);
              get.onsuccess = () => {
                const { _doc_id_rev: _key, ...body } = get.result as Record<string, unknown>;
                docs.push({ _id: meta.id, _rev: meta.winningRev, ...body });
                if (--pending === 0) {
                  db.close();
                  resolve(docs.sort((a, b) => (String(a._id) < String(b._id) ? -1 : 1)));
                }
              };
              get.onerror = () => reject(get.error ?? new Error('a document could not be read'));
            }
          };
          all.onerror = () => reject(all.error ?? new Error('the log could not be read'));
        };
      }),
    POUCH_DB_NAME,
  );
}

/** Every job record in the browser's log, exactly as stored, sorted by id. */
export async function storedRecords(page: Page): Promise<Record<string, unknown>[]> {
  return (await storedDocs(page)).map((doc) => doc.job as Record<string, unknown>);
}

/** Deletes the job log's database (PouchDB closes its connection when asked). */
export function wipeLog(page: Page): Promise<void> {
  return page.evaluate(
    (name) =>
      new Promise<void>((resolve, reject) => {
        const request = indexedDB.deleteDatabase(name);
        request.onsuccess = () => resolve();
        request.onerror = () => reject(request.error ?? new Error('the log could not be deleted'));
      }),
    POUCH_DB_NAME,
  );
}

/** The import report's words for a file that only adds or only repeats (English). */
export function importReport(added: number, updated: number, unchanged: number, conflicts = 0, clamped = 0): string {
  return `Backup read: ${added} added, ${updated} merged, ${unchanged} unchanged. Changed on two devices (both values kept, shown on the job): ${conflicts}. Times in the future set to now: ${clamped}.`;
}
