import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import { compareNewestFirst, currentShiftFilter, matchesFilter, type JobFilter } from '../../src/jobs/query';
import { JOB_STATUSES } from '../../src/jobs/schema';
import { SHIFT_IDS } from '../../src/jobs/shift';
import { freshStore, pinionDraft, unwrap } from './helpers';

const local = (day: number, hh: number, mm = 0) => new Date(2025, 2, day, hh, mm);

async function seeded() {
  const store = await freshStore();
  const add = async (now: Date, overrides: Parameters<typeof pinionDraft>[0]) =>
    unwrap(await store.add(pinionDraft(overrides), { now }));
  const jobs = {
    nightF1: await add(local(5, 2), { furnace: 'F1', status: 'done', notes: 'Nitrógeno purge before load' }),
    morningF2: await add(local(5, 7), { furnace: 'F2', partNumber: 'KR-4410', status: 'inFurnace', operator: 'JR' }),
    morningF1: await add(local(5, 9), {
      furnace: 'F1',
      status: 'onHold',
      workOrder: 'WO-024199',
      notes: 'Öl temperature high',
    }),
    lateF3: await add(local(5, 22, 30), { furnace: 'F3', partNumber: 'KR-0907', status: 'planned' }),
    nextDay: await add(local(6, 10), { furnace: 'F1', status: 'planned', operator: 'AL' }),
  };
  return { store, jobs };
}

describe('job list filters', () => {
  it('opens on the current shift: at 10:00 on the 5th, shift A of the 5th only', async () => {
    const { store, jobs } = await seeded();
    const filter = currentShiftFilter(local(5, 10));
    expect(filter).toEqual({ fromDate: '2025-03-05', toDate: '2025-03-05', shift: 'A' });
    expect(unwrap(await store.list(filter)).jobs.map((j) => j.id)).toEqual([jobs.morningF1.id, jobs.morningF2.id]);
    // 03:00 on the 6th is still shift C of the 5th.
    expect(unwrap(await store.list(currentShiftFilter(local(6, 3)))).jobs.map((j) => j.id)).toEqual([jobs.lateF3.id]);
    store.close();
  });

  it('filters by date range, shift, furnace, part and status, newest first', async () => {
    const { store, jobs } = await seeded();
    const ids = async (filter: JobFilter) => unwrap(await store.list(filter)).jobs.map((j) => j.id);
    expect(await ids({})).toEqual(
      [jobs.nextDay, jobs.lateF3, jobs.morningF1, jobs.morningF2, jobs.nightF1].map((j) => j.id),
    );
    expect(await ids({ fromDate: '2025-03-05', toDate: '2025-03-05' })).toEqual(
      [jobs.lateF3, jobs.morningF1, jobs.morningF2].map((j) => j.id),
    );
    expect(await ids({ fromDate: '2025-03-04', toDate: '2025-03-04' })).toEqual([jobs.nightF1.id]);
    expect(await ids({ shift: 'C' })).toEqual([jobs.lateF3.id, jobs.nightF1.id]);
    expect(await ids({ furnace: 'F1' })).toEqual([jobs.nextDay, jobs.morningF1, jobs.nightF1].map((j) => j.id));
    expect(await ids({ furnace: 'F1', fromDate: '2025-03-05' })).toEqual([jobs.nextDay.id, jobs.morningF1.id]);
    expect(await ids({ partNumber: 'KR-0907' })).toEqual([jobs.lateF3.id]);
    expect(await ids({ status: 'planned' })).toEqual([jobs.nextDay.id, jobs.lateF3.id]);
    expect(await ids({ status: ['onHold', 'inFurnace'] })).toEqual([jobs.morningF1.id, jobs.morningF2.id]);
    expect(await ids({ fromDate: '2025-03-06', toDate: '2025-03-05' })).toEqual([]);
    store.close();
  });

  it('text search looks in work order, part, notes and operator, ignores case and accents, needs every word', async () => {
    const { store, jobs } = await seeded();
    const ids = async (text: string) => unwrap(await store.list({ text })).jobs.map((j) => j.id);
    expect(await ids('nitrogeno')).toEqual([jobs.nightF1.id]);
    expect(await ids('OL TEMPERATURE')).toEqual([jobs.morningF1.id]);
    expect(await ids('024199')).toEqual([jobs.morningF1.id]);
    expect(await ids('kr-4410')).toEqual([jobs.morningF2.id]);
    expect(await ids('jr')).toEqual([jobs.morningF2.id]);
    expect(await ids('purge high')).toEqual([]);
    expect(await ids('   ')).toHaveLength(5);
    store.close();
  });

  it('property: the store list equals the filter applied to every job, newest first', async () => {
    const store = await freshStore();
    const all = demoJobs({ count: 400, end: new Date('2025-06-30T12:00:00Z'), seed: 7 });
    unwrap(await store.putMany(all));
    const date = fc
      .integer({ min: 0, max: 400 })
      .map((d) => new Date(Date.UTC(2024, 5, 1 + d)).toISOString().slice(0, 10));
    const filters = fc.record(
      {
        fromDate: date,
        toDate: date,
        shift: fc.constantFrom(...SHIFT_IDS),
        furnace: fc.constantFrom('F1', 'F2', 'F3', 'F9'),
        partNumber: fc.constantFrom('KR-2231', 'KR-4410', 'KR-0907'),
        status: fc.oneof(fc.constantFrom(...JOB_STATUSES), fc.subarray([...JOB_STATUSES])),
        text: fc.constantFrom('MK', 'coupon', 'WO-0241', 'dip 2 h', 'zz'),
      },
      { requiredKeys: [] },
    );
    await fc.assert(
      fc.asyncProperty(filters, async (filter) => {
        const expected = all
          .filter((job) => matchesFilter(job, filter))
          .sort(compareNewestFirst)
          .map((j) => j.id);
        expect(unwrap(await store.list(filter)).jobs.map((j) => j.id)).toEqual(expected);
      }),
      { numRuns: 150 },
    );
    store.close();
  });
});
