/**
 * Two tabs = two connections to the same database. A write names the revision it replaces, so
 * of two writes to one job at the same moment one is turned back; a one-tap change is then
 * redone on the newer copy, while an edit from an open form is refused as stale.
 */
import { describe, expect, it } from 'vitest';
import { backupToJson, createBackup } from '../../src/jobs/backup';
import { demoJobs } from '../../src/app/log/demo/demoLog';
import { importBackup } from '../../src/jobs/transfer';
import { freshStore, pinionDraft, uniqueDbName, unwrap } from './helpers';

async function twoTabs() {
  const name = uniqueDbName();
  return [await freshStore(name), await freshStore(name)] as const;
}

describe('two tabs saving at the same time', () => {
  it('100 adds from each tab, interleaved: all 200 are there, seen from both tabs', async () => {
    const [tab1, tab2] = await twoTabs();
    const saves = Array.from({ length: 100 }, (_, i) => [
      tab1.add(pinionDraft({ workOrder: `T1-${i}`, furnace: 'F1' })),
      tab2.add(pinionDraft({ workOrder: `T2-${i}`, furnace: 'F2' })),
    ]).flat();
    const results = await Promise.all(saves);
    expect(results.every((r) => r.ok)).toBe(true);
    for (const tab of [tab1, tab2]) {
      const { jobs } = unwrap(await tab.readAll());
      expect(jobs).toHaveLength(200);
      expect(new Set(jobs.map((j) => j.workOrder)).size).toBe(200);
    }
    tab1.close();
    tab2.close();
  });

  it('edits of different fields of one job from both tabs both survive', async () => {
    const [tab1, tab2] = await twoTabs();
    const job = unwrap(await tab1.add(pinionDraft()));
    const rounds = Array.from({ length: 20 }, (_, i) => [
      tab1.update(job.id, { status: i % 2 ? 'inFurnace' : 'done' }),
      tab2.update(job.id, { notes: `note ${i}` }),
    ]).flat();
    expect((await Promise.all(rounds)).every((r) => r.ok)).toBe(true);
    const final = unwrap(await tab1.get(job.id));
    expect(final.status).toBe('inFurnace');
    expect(final.notes).toBe('note 19');
    tab1.close();
    tab2.close();
  });

  it('an import in one tab while the other adds: the import and every add are kept', async () => {
    const [tab1, tab2] = await twoTabs();
    const file = backupToJson(
      createBackup(demoJobs({ count: 300, end: new Date('2025-06-30T12:00:00Z'), seed: 2 }), 'x'),
    );
    const [report, ...adds] = await Promise.all([
      importBackup(tab1, file),
      ...Array.from({ length: 30 }, (_, i) => tab2.add(pinionDraft({ workOrder: `LIVE-${i}` }))),
    ]);
    expect(unwrap(report)).toEqual({ added: 300, updated: 0, unchanged: 0, conflicts: 0, clamped: 0 });
    expect(adds.every((r) => r.ok)).toBe(true);
    expect(unwrap(await tab2.count())).toBe(330);
    tab1.close();
    tab2.close();
  });

  it('a form left open in one tab never writes over what the other tab saved meanwhile', async () => {
    const [tab1, tab2] = await twoTabs();
    const job = unwrap(await tab1.add(pinionDraft()));
    const opened = unwrap(await tab2.entry(job.id));
    unwrap(await tab1.update(job.id, { notes: 'Coupon moved to basket 2.' }, { baseRev: opened.rev }));
    // The same field from the old revision: refused, the field named, nothing written.
    const stale = await tab2.update(job.id, { notes: 'Coupon in basket 3.', furnace: 'F3' }, { baseRev: opened.rev });
    expect(stale).toEqual({
      ok: false,
      error: { code: 'record.stale', params: { id: job.id }, issues: [{ path: 'notes', problem: 'changedMeanwhile' }] },
    });
    expect(unwrap(await tab2.get(job.id))).toMatchObject({ notes: 'Coupon moved to basket 2.', furnace: 'F1' });
    // Another field from the old revision: applied, and the other tab's note stays.
    unwrap(await tab2.update(job.id, { furnace: 'F3' }, { baseRev: opened.rev }));
    expect(unwrap(await tab1.get(job.id))).toMatchObject({ notes: 'Coupon moved to basket 2.', furnace: 'F3' });
    tab1.close();
    tab2.close();
  });
});
