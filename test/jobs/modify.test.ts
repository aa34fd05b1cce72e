/** store.modify: an edit computed from the stored job at the moment of writing, in one transaction. */
import { describe, expect, it } from 'vitest';
import { persistentStorageStatus } from '../../src/jobs/persist';
import { memoryPouch } from '../memoryPouch';
import { freshStore, pinionDraft, uniqueDbName, unwrap } from './helpers';

const appendLine = (notes: string, line: string) => (notes ? `${notes}\n${line}` : line);

describe('JobStore.modify', () => {
  it('lines appended from two tabs at the same moment are all kept (20 from each)', async () => {
    const name = uniqueDbName();
    const [tab1, tab2] = [await freshStore(name), await freshStore(name)];
    const job = unwrap(await tab1.add(pinionDraft()));
    const writes = Array.from({ length: 20 }, (_, i) => [
      tab1.modify(job.id, (current) => ({ notes: appendLine(current.notes, `tab1 ${i}`) })),
      tab2.modify(job.id, (current) => ({ notes: appendLine(current.notes, `tab2 ${i}`) })),
    ]).flat();
    expect((await Promise.all(writes)).every((r) => r.ok)).toBe(true);
    const lines = unwrap(await tab2.get(job.id)).notes.split('\n');
    expect(lines).toHaveLength(40);
    expect(new Set(lines).size).toBe(40);
    tab1.close();
    tab2.close();
  });

  it('an invalid change is refused with the field path and the job stays as it was', async () => {
    const store = await freshStore();
    const job = unwrap(await store.add(pinionDraft()));
    const result = await store.modify(job.id, () => ({ operator: 'TOOLONG' }));
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.error.code).toBe('record.invalid');
      expect(result.error.issues?.[0]?.path).toBe('operator');
    }
    expect(unwrap(await store.get(job.id))).toEqual(job);
    store.close();
  });

  it('reports a missing job, and a damaged one instead of editing it blind', async () => {
    const name = uniqueDbName();
    const store = await freshStore(name);
    const missing = await store.modify('0b7f3c1e-2a4d-4e5f-8a9b-1c2d3e4f5a6b', () => ({ notes: 'x' }));
    expect(!missing.ok && missing.error.code).toBe('record.notFound');
    const job = unwrap(await store.add(pinionDraft()));
    // Damage the record behind the store's back (as another program or a newer app might).
    const raw = memoryPouch(name);
    const doc = await raw.get(job.id);
    await raw.put({ ...doc, job: { ...(doc.job as object), operator: 42 } });
    let called = false;
    const damaged = await store.modify(job.id, () => {
      called = true;
      return { notes: 'x' };
    });
    expect(!damaged.ok && damaged.error.code).toBe('record.invalid');
    expect(called).toBe(false);
    store.close();
  });
});

describe('persistentStorageStatus', () => {
  it('reads whether the log is kept, without asking the browser to keep it', async () => {
    let asked = false;
    const persist = async () => {
      asked = true;
      return true;
    };
    expect(await persistentStorageStatus({ persisted: async () => true, persist })).toBe('granted');
    expect(await persistentStorageStatus({ persisted: async () => false, persist })).toBe('denied');
    expect(await persistentStorageStatus({ persisted: async () => Promise.reject(new Error('SecurityError')) })).toBe(
      'denied',
    );
    expect(await persistentStorageStatus(undefined)).toBe('unsupported');
    expect(asked).toBe(false);
  });
});
