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
    // A new device (or a wiped one) reads the file back.
    const other = await freshStore();
    expect(unwrap(await importBackup(other, file.text))).toEqual({
      added: 121,
      updated: 0,
      unchanged: 0,
      conflicts: 0,
      clamped: 0,
    });
    expect(await snapshot(other)).toEqual(before);
    // Importing the same file again changes nothing, here or on the device that wrote it.
    for (const target of [other, store]) {
      expect(unwrap(await importBackup(target, file.text))).toEqual({
        added: 0,
        updated: 0,
        unchanged: 121,
        conflicts: 0,
        clamped: 0,
      });
    }
    expect(await snapshot(other)).toEqual(before);
    store.close();
    other.close();
  });
});

describe('file names', () => {
  it('carry the local date', () => {
    expect(exportFileName('json', new Date(2025, 2, 5, 23, 59))).toBe('casefront-job-log-2025-03-05.json');
    expect(exportFileName('csv', new Date(2025, 11, 31, 0, 0))).toBe('casefront-job-log-2025-12-31.csv');
  });
});

/** Device A's log with one pinion job, and device B holding a copy read from A's backup. */
async function twoDevices() {
  const a = await freshStore();
  const b = await freshStore();
  const job = unwrap(await a.add(pinionDraft({ status: 'inFurnace' }), { now: new Date('2025-03-05T07:00:00.000Z') }));
  unwrap(await importBackup(b, unwrap(await exportBackup(a, 'x')).text));
  return { a, b, job };
}

describe('import merge: field by field, never by clock', () => {
  it('the lab result recorded on A and the status set later on B both survive B’s backup read into A', async () => {
    const { a, b, job } = await twoDevices();
    unwrap(await a.update(job.id, { lab: { ecdMm: 0.77 } }, { now: new Date('2025-03-05T12:00:00.000Z') }));
    unwrap(await b.update(job.id, { status: 'done' }, { now: new Date('2025-03-05T13:00:00.000Z') }));
    const report = unwrap(await importBackup(a, unwrap(await exportBackup(b, 'x')).text));
    expect(report).toEqual({ added: 0, updated: 1, unchanged: 0, conflicts: 0, clamped: 0 });
    expect(unwrap(await a.get(job.id))).toMatchObject({ status: 'done', lab: { ecdMm: 0.77 } });
    // And the other way round.
    unwrap(await importBackup(b, unwrap(await exportBackup(a, 'x')).text));
    expect(unwrap(await b.get(job.id))).toMatchObject({ status: 'done', lab: { ecdMm: 0.77 } });
    expect(unwrap(await b.entry(job.id)).open).toEqual({});
  });

  it('with A’s clock 2 h fast the outcome is the same: the later lab result on B is not dropped', async () => {
    const { a, b, job } = await twoDevices();
    unwrap(await a.update(job.id, { status: 'done' }, { now: new Date('2025-03-05T14:00:00.000Z') })); // 12:00 real
    unwrap(await b.update(job.id, { lab: { ecdMm: 0.81 } }, { now: new Date('2025-03-05T13:00:00.000Z') }));
    unwrap(await importBackup(a, unwrap(await exportBackup(b, 'x')).text));
    unwrap(await importBackup(b, unwrap(await exportBackup(a, 'x')).text));
    for (const device of [a, b]) {
      expect(unwrap(await device.get(job.id))).toMatchObject({ status: 'done', lab: { ecdMm: 0.81 } });
    }
  });

  it('the same field changed on both keeps both values, shown as open, until a person picks one', async () => {
    const { a, b, job } = await twoDevices();
    unwrap(await a.update(job.id, { lab: { ecdMm: 0.77 } }));
    unwrap(await b.update(job.id, { lab: { ecdMm: 0.79 } }));
    const report = unwrap(await importBackup(a, unwrap(await exportBackup(b, 'x')).text));
    expect(report.conflicts).toBe(1);
    const entry = unwrap(await a.entry(job.id));
    expect(entry.job.lab).toEqual({ ecdMm: 0.77 });
    expect(entry.open.lab?.map((alt) => alt.value)).toEqual([{ ecdMm: 0.77 }, { ecdMm: 0.79 }]);
    // B reads A's file: the same two values, open there too.
    unwrap(await importBackup(b, unwrap(await exportBackup(a, 'x')).text));
    expect(
      unwrap(await b.entry(job.id))
        .open.lab?.map((alt) => alt.value)
        .sort((x, y) => JSON.stringify(x).localeCompare(JSON.stringify(y))),
    ).toEqual([{ ecdMm: 0.77 }, { ecdMm: 0.79 }]);
    // The person on A picks 0.79; B reads that and agrees, nothing left open anywhere.
    unwrap(await a.update(job.id, { lab: { ecdMm: 0.79 } }, { baseRev: entry.rev, settle: ['lab'] }));
    expect(unwrap(await a.entry(job.id)).open).toEqual({});
    unwrap(await importBackup(b, unwrap(await exportBackup(a, 'x')).text));
    const settled = unwrap(await b.entry(job.id));
    expect(settled.open).toEqual({});
    expect(settled.job.lab).toEqual({ ecdMm: 0.79 });
  });

  it('a file without change history: equal jobs are unchanged, a differing field is kept both ways', async () => {
    const store = await freshStore();
    const [x, y] = demoJobs({ count: 2, end: END, seed: 4 });
    unwrap(await store.putMany([x, y]));
    const edited: Job = { ...y!, notes: 'written on the office PC', updatedAt: '2000-01-01T00:00:00.000Z' };
    const fresh: Job = { ...x!, id: crypto.randomUUID(), workOrder: 'WO-NEW' };
    const text = backupToJson(createBackup([x!, edited, fresh], 'x'));
    expect(unwrap(await importBackup(store, text))).toEqual({
      added: 1,
      updated: 1,
      unchanged: 1,
      conflicts: 1,
      clamped: 0,
    });
    const entry = unwrap(await store.entry(y!.id));
    expect(entry.job.notes).toBe(y!.notes);
    expect(entry.open.notes?.map((alt) => alt.value)).toEqual([y!.notes, edited.notes]);
    expect(unwrap(await store.get(fresh.id))).toEqual(fresh);
    store.close();
  });

  it('timestamps far in the future are set to the time of the import, so the job sorts and edits normally', async () => {
    const store = await freshStore();
    const [x] = demoJobs({ count: 1, end: END, seed: 8 });
    const wild: Job = { ...x!, updatedAt: '2099-01-01T00:00:00.000Z' };
    const now = new Date('2025-07-01T08:00:00.000Z');
    expect(unwrap(await importBackup(store, backupToJson(createBackup([wild], 'x')), { now }))).toEqual({
      added: 1,
      updated: 0,
      unchanged: 0,
      conflicts: 0,
      clamped: 1,
    });
    expect(unwrap(await store.get(x!.id)).updatedAt).toBe(now.toISOString());
    const later = new Date('2025-07-01T09:00:00.000Z');
    expect(unwrap(await store.update(x!.id, { notes: 'checked' }, { now: later })).updatedAt).toBe(later.toISOString());
    store.close();
  });

  it('an id repeated inside the file counts once', async () => {
    const store = await freshStore();
    const [x] = demoJobs({ count: 1, end: END, seed: 8 });
    const later = { ...x!, status: 'rejected' as const };
    expect(unwrap(await importBackup(store, backupToJson(createBackup([x!, later], 'x'))))).toEqual({
      added: 1,
      updated: 0,
      unchanged: 0,
      conflicts: 0,
      clamped: 0,
    });
    expect(unwrap(await store.count())).toBe(1);
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
