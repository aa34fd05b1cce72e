import { describe, expect, it } from 'vitest';
import { openJobStore } from '../../src/jobs/store';
import { memoryPouch } from '../memoryPouch';
import { freshStore, pinionDraft, uniqueDbName, unwrap } from './helpers';

const UUID = /^[\da-f]{8}-[\da-f]{4}-4[\da-f]{3}-[89ab][\da-f]{3}-[\da-f]{12}$/u;

describe('job store: create, read, update, delete', () => {
  it('add sets id, timestamps and the shift of the moment, and get returns the same record', async () => {
    const store = await freshStore();
    const now = new Date(2025, 2, 5, 2, 0); // 02:00 on the 5th: shift C of the 4th
    const job = unwrap(await store.add(pinionDraft(), { now }));
    expect(job.id).toMatch(UUID);
    expect(job.createdAt).toBe(now.toISOString());
    expect(job.updatedAt).toBe(job.createdAt);
    expect(job).toMatchObject({ shift: 'C', shiftDate: '2025-03-04', operator: 'MK', status: 'planned' });
    expect(unwrap(await store.get(job.id))).toEqual(job);
    store.close();
  });

  it('tidies typed fields: trims, upper-cases initials; keeps notes verbatim', async () => {
    const store = await freshStore();
    const job = unwrap(await store.add(pinionDraft({ operator: ' mk ', furnace: ' F2', notes: '  two spaces  ' })));
    expect(job.operator).toBe('MK');
    expect(job.furnace).toBe('F2');
    expect(job.notes).toBe('  two spaces  ');
    store.close();
  });

  it('rejects a draft with bad initials and stores nothing, naming the field', async () => {
    const store = await freshStore();
    for (const operator of ['', 'ABCDE', 'M1', 'M.K']) {
      const result = await store.add(pinionDraft({ operator }));
      expect(result.ok).toBe(false);
      if (!result.ok) {
        expect(result.error.code).toBe('record.invalid');
        expect(result.error.issues?.[0]?.path).toBe('operator');
      }
    }
    expect(unwrap(await store.count())).toBe(0);
    expect((await store.add(pinionDraft({ operator: 'ÑÖ' }))).ok).toBe(true);
    store.close();
  });

  it('update changes only the given fields, keeps id and createdAt, and moves updatedAt forward', async () => {
    const store = await freshStore();
    const created = new Date('2025-03-05T08:00:00.000Z');
    const job = unwrap(await store.add(pinionDraft(), { now: created }));
    // A device clock set back must not make the edit look older than the record.
    const edited = unwrap(
      await store.update(
        job.id,
        { status: 'done', lab: { ecdMm: 0.82, surfaceHardness: { value: 60, unit: 'HRC' } } },
        { now: new Date('2025-03-05T07:00:00.000Z') },
      ),
    );
    expect(edited.status).toBe('done');
    expect(edited.lab).toEqual({ ecdMm: 0.82, surfaceHardness: { value: 60, unit: 'HRC' } });
    expect(edited.id).toBe(job.id);
    expect(edited.createdAt).toBe(job.createdAt);
    expect(edited.updatedAt > job.updatedAt).toBe(true);
    expect({ ...edited, status: job.status, lab: undefined, updatedAt: job.updatedAt }).toEqual({
      ...job,
      lab: undefined,
    });
    expect(unwrap(await store.get(job.id))).toEqual(edited);
    store.close();
  });

  it('update can clear an optional field, refuses to touch id or createdAt, and refuses invalid results', async () => {
    const store = await freshStore();
    const job = unwrap(await store.add(pinionDraft({ lab: { ecdMm: 0.8 } })));
    const cleared = unwrap(await store.update(job.id, { lab: undefined }));
    expect('lab' in cleared).toBe(false);
    const idChange = await store.update(job.id, { id: crypto.randomUUID() });
    expect(idChange.ok ? null : idChange.error.issues?.[0]).toMatchObject({ path: 'id', problem: 'unknownField' });
    const badStatus = await store.update(job.id, { status: 'lost' });
    expect(badStatus.ok ? null : badStatus.error.issues?.[0]).toMatchObject({ path: 'status', problem: 'notOneOf' });
    const removeRequired = await store.update(job.id, { furnace: undefined });
    expect(removeRequired.ok ? null : removeRequired.error.issues?.[0]).toMatchObject({
      path: 'furnace',
      problem: 'missing',
    });
    expect(unwrap(await store.get(job.id))).toEqual(cleared);
    store.close();
  });

  it('missing ids give record.notFound for get and update; the store has no way to delete a job', async () => {
    const store = await freshStore();
    const id = crypto.randomUUID();
    for (const result of [await store.get(id), await store.update(id, { notes: 'x' })]) {
      expect(result).toEqual({ ok: false, error: { code: 'record.notFound', params: { id } } });
    }
    expect('remove' in store).toBe(false);
    store.close();
  });

  it('a damaged stored record is reported beside the list, which still shows the good ones', async () => {
    const name = uniqueDbName();
    const store = await freshStore(name);
    const good = unwrap(await store.add(pinionDraft()));
    const brokenId = crypto.randomUUID();
    // Written behind the store's back, as another program or a newer app on another device might.
    const raw = memoryPouch(name);
    await raw.put({
      _id: brokenId,
      type: 'job',
      versions: {},
      job: { ...good, id: brokenId, operator: 42, status: 'misplaced' },
    });
    await raw.put({ _id: '7', junk: '<img src=x onerror=alert(1)>' });
    const list = unwrap(await store.readAll());
    expect(list.jobs).toEqual([good]);
    expect(list.corrupt.map((c) => c.key).sort()).toEqual(['7', brokenId].sort());
    expect(list.corrupt.find((c) => c.key === brokenId)?.issues.map((i) => i.path)).toEqual(['operator', 'status']);
    expect(list.corrupt.find((c) => c.key === '7')?.issues).toEqual([{ path: 'job', problem: 'missing' }]);
    const single = await store.get(brokenId);
    expect(single.ok ? null : single.error.code).toBe('record.invalid');
    // An edit that supplies the missing pieces repairs the record.
    const repaired = unwrap(await store.update(brokenId, { operator: 'JR', status: 'onHold' }));
    expect(repaired.operator).toBe('JR');
    store.close();
  });

  it('putMany validates every record first and names the bad one by position', async () => {
    const store = await freshStore();
    const job = unwrap(await store.add(pinionDraft()));
    const result = await store.putMany([
      { ...job, id: crypto.randomUUID() },
      { ...job, id: crypto.randomUUID(), createdAt: 'yesterday' },
    ]);
    expect(result.ok ? null : result.error.issues?.[0]?.path).toBe('[1].createdAt');
    expect(unwrap(await store.count())).toBe(1);
    store.close();
  });

  it('a closed store answers storage.closed instead of throwing', async () => {
    const store = await freshStore();
    store.close();
    expect(await store.add(pinionDraft())).toEqual({ ok: false, error: { code: 'storage.closed' } });
    expect(await store.list()).toEqual({ ok: false, error: { code: 'storage.closed' } });
  });

  it('a database that cannot be opened is reported by name, not thrown', async () => {
    const failing = () => {
      throw new DOMException('no storage here', 'UnknownError');
    };
    expect(await openJobStore({ name: uniqueDbName(), pouch: failing, legacyName: false })).toEqual({
      ok: false,
      error: { code: 'storage.failed', params: { name: 'UnknownError' } },
    });
  });
});
