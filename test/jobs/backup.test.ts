import { describe, expect, it } from 'vitest';
import { createI18n, LANGUAGES } from '../../src/i18n/i18n';
import { backupToJson, createBackup, parseBackup } from '../../src/jobs/backup';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import { describeJobsError } from '../../src/jobs/result';
import { JOB_RECORD_VERSION, type Job } from '../../src/jobs/schema';
import { exportBackup, exportFileName, importBackup } from '../../src/jobs/transfer';
import { freshStore, pinionDraft, snapshot, unwrap } from './helpers';

const END = new Date('2025-06-30T12:00:00.000Z');

describe('JSON backup: export, wipe, import', () => {
  it('gives back identical records', async () => {
    const store = await freshStore();
    unwrap(await store.putMany(demoJobs({ count: 120, end: END, seed: 21 })));
    unwrap(await store.add(pinionDraft({ notes: '<script>alert(1)</script> =1+1 «ñ» \u0000 tab\there' })));
    const before = await snapshot(store);
    const file = unwrap(await exportBackup(store, '0.1.0', END));
    expect(file.jobCount).toBe(121);
    const data = JSON.parse(file.text);
    expect(data).toMatchObject({
      format: 'casefront-job-log',
      version: JOB_RECORD_VERSION,
      exportedAt: END.toISOString(),
      appVersion: '0.1.0',
    });
    unwrap(await store.clear());
    expect(unwrap(await store.count())).toBe(0);
    expect(unwrap(await importBackup(store, file.text))).toEqual({
      added: 121,
      updated: 0,
      unchanged: 0,
      skippedOlder: 0,
    });
    expect(await snapshot(store)).toEqual(before);
    // Importing the same file again changes nothing.
    expect(unwrap(await importBackup(store, file.text))).toEqual({
      added: 0,
      updated: 0,
      unchanged: 121,
      skippedOlder: 0,
    });
    expect(await snapshot(store)).toEqual(before);
    store.close();
  });
});

describe('file names', () => {
  it('carry the local date', () => {
    expect(exportFileName('json', new Date(2025, 2, 5, 23, 59))).toBe('casefront-job-log-2025-03-05.json');
    expect(exportFileName('csv', new Date(2025, 11, 31, 0, 0))).toBe('casefront-job-log-2025-12-31.csv');
  });
});

describe('import merge: same id, newest updatedAt wins', () => {
  it('counts added, updated, unchanged and skippedOlder, and keeps the newer copy each time', async () => {
    const store = await freshStore();
    const [a, b, c] = demoJobs({ count: 3, end: END, seed: 4 });
    unwrap(await store.putMany([a, b, c]));
    const newerB: Job = { ...b!, notes: 'lab result added on the office PC', updatedAt: '2099-01-01T00:00:00.000Z' };
    const olderC: Job = { ...c!, notes: 'stale copy', updatedAt: '2000-01-01T00:00:00.000Z' };
    const sameTimeC: Job = { ...c!, notes: 'different text, same time' };
    const fresh: Job = { ...a!, id: crypto.randomUUID(), workOrder: 'WO-NEW' };
    const text = backupToJson(createBackup([a!, newerB, olderC, fresh], 'x'));
    expect(unwrap(await importBackup(store, text))).toEqual({ added: 1, updated: 1, unchanged: 1, skippedOlder: 1 });
    expect(unwrap(await store.get(b!.id)).notes).toBe(newerB.notes);
    expect(unwrap(await store.get(c!.id))).toEqual(c);
    expect(unwrap(await store.get(fresh.id))).toEqual(fresh);
    // Equal time but different content is not newer: the local copy stays.
    expect(unwrap(await importBackup(store, backupToJson(createBackup([sameTimeC], 'x'))))).toEqual({
      added: 0,
      updated: 0,
      unchanged: 0,
      skippedOlder: 1,
    });
    expect(unwrap(await store.get(c!.id))).toEqual(c);
    store.close();
  });

  it('an id repeated inside the file counts once, with its newest version', async () => {
    const store = await freshStore();
    const [a] = demoJobs({ count: 1, end: END, seed: 8 });
    const later = { ...a!, status: 'rejected' as const, updatedAt: '2099-01-01T00:00:00.000Z' };
    expect(unwrap(await importBackup(store, backupToJson(createBackup([later, a!], 'x'))))).toEqual({
      added: 1,
      updated: 0,
      unchanged: 0,
      skippedOlder: 0,
    });
    expect(unwrap(await store.get(a!.id)).status).toBe('rejected');
    store.close();
  });
});

describe('invalid imports leave the log unchanged and say what is wrong', () => {
  const valid = () => createBackup(demoJobs({ count: 3, end: END, seed: 13 }), '0.1.0', END);
  const cases: [string, () => string, string, string?][] = [
    ['not JSON', () => '{"format": "casefront-job-log", ', 'import.notJson'],
    ['a CSV file', () => 'id,created_at\n1,2', 'import.notJson'],
    ["another program's JSON", () => JSON.stringify({ rows: [] }), 'import.wrongFormat'],
    ['an array', () => '[]', 'import.wrongFormat'],
    [
      'a newer version',
      () => JSON.stringify({ ...valid(), version: JOB_RECORD_VERSION + 1 }),
      'import.unsupportedVersion',
    ],
    [
      'one bad initials among good records',
      () => {
        const b = valid();
        (b.jobs[2] as Record<string, unknown>).operator = 'ABCDE';
        return JSON.stringify(b);
      },
      'import.invalid',
      'jobs[2].operator',
    ],
    [
      'a status spelled the old way',
      () => {
        const b = valid();
        (b.jobs[1] as Record<string, unknown>).status = 'in-furnace';
        return JSON.stringify(b);
      },
      'import.invalid',
      'jobs[1].status',
    ],
    [
      'a missing field',
      () => {
        const b = valid();
        delete (b.jobs[0] as Record<string, unknown>).furnace;
        return JSON.stringify(b);
      },
      'import.invalid',
      'jobs[0].furnace',
    ],
    [
      'an unknown field',
      () => {
        const b = valid();
        (b.jobs[0] as Record<string, unknown>).html = '<b>x</b>';
        return JSON.stringify(b);
      },
      'import.invalid',
      'jobs[0].html',
    ],
    [
      'a text where a depth belongs',
      () => {
        const b = valid();
        (b.jobs[0]!.prediction as Record<string, unknown>).effectiveCaseDepthMm = '0.8';
        return JSON.stringify(b);
      },
      'import.invalid',
      'jobs[0].prediction.effectiveCaseDepthMm',
    ],
    ['jobs not a list', () => JSON.stringify({ ...valid(), jobs: {} }), 'import.invalid', 'jobs'],
  ];

  it.each(cases)('%s → %s', async (_label, makeText, code, path) => {
    const store = await freshStore();
    unwrap(await store.putMany(demoJobs({ count: 5, end: END, seed: 1 })));
    const before = await snapshot(store);
    const result = await importBackup(store, makeText());
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error.code).toBe(code);
      if (path) expect(result.error.issues?.[0]?.path).toBe(path);
    }
    expect(await snapshot(store)).toEqual(before);
    store.close();
  });

  it('a "__proto__" key in a record is refused as an unknown field and pollutes nothing', async () => {
    const store = await freshStore();
    const text = JSON.stringify(valid()).replace('"notes":', '"__proto__":{"polluted":true},"notes":');
    const result = await importBackup(store, text);
    expect(result.ok ? null : result.error.issues?.[0]).toEqual({
      path: 'jobs[0].__proto__',
      problem: 'unknownField',
      params: { expected: 'never' },
    });
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(unwrap(await store.count())).toBe(0);
    store.close();
  });

  it.each(LANGUAGES)('the message in %s names the path and the problem, with no placeholder left', (language) => {
    const i18n = createI18n(language);
    const t = (key: string, params?: Record<string, string | number>) => i18n.t(key, params ?? {});
    const b = valid();
    (b.jobs[2] as Record<string, unknown>).operator = 'ABCDE';
    const result = parseBackup(JSON.stringify(b));
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const message = describeJobsError(t, result.error);
    expect(message).toContain('jobs[2].operator');
    expect(message).not.toMatch(/\{\{|\}\}|jobs\.errors|jobs\.problems/u);
    expect(message).toContain('MK');
  });
});
