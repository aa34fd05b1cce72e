import { openDB } from 'idb';
import { describe, expect, it, vi } from 'vitest';
import { requestPersistentStorage } from '../../src/jobs/persist';
import { openJobStore } from '../../src/jobs/store';
import { memoryPouch } from '../memoryPouch';
import { uniqueDbName } from './helpers';

describe('requestPersistentStorage', () => {
  it('granted when the browser agrees or already persists', async () => {
    expect(await requestPersistentStorage({ persist: async () => true })).toBe('granted');
    const persist = vi.fn(async () => false);
    expect(await requestPersistentStorage({ persisted: async () => true, persist })).toBe('granted');
    expect(persist).not.toHaveBeenCalled();
  });
  it('denied when the browser refuses or the call fails', async () => {
    expect(await requestPersistentStorage({ persisted: async () => false, persist: async () => false })).toBe('denied');
    expect(await requestPersistentStorage({ persist: async () => Promise.reject(new Error('SecurityError')) })).toBe(
      'denied',
    );
  });
  it('unsupported without the Storage API', async () => {
    expect(await requestPersistentStorage(undefined)).toBe('unsupported');
    expect(await requestPersistentStorage({})).toBe('unsupported');
  });
  it('reads navigator.storage by default', async () => {
    vi.stubGlobal('navigator', { storage: { persist: async () => true } });
    try {
      expect(await requestPersistentStorage()).toBe('granted');
    } finally {
      vi.unstubAllGlobals();
    }
  });
});

describe('an earlier log saved by a newer release', () => {
  it('is not moved by this one: storage.newerVersion, and the newer data is untouched', async () => {
    const name = uniqueDbName();
    const newer = await openDB(name, 7, { upgrade: (db) => void db.createObjectStore('jobs', { keyPath: 'id' }) });
    await newer.put('jobs', { id: 'from-the-future', shape: 'unknown to us' });
    newer.close();
    expect(await openJobStore({ name: uniqueDbName(), pouch: memoryPouch, legacyName: name })).toEqual({
      ok: false,
      error: { code: 'storage.newerVersion' },
    });
    const check = await openDB(name);
    expect(check.version).toBe(7);
    expect(await check.get('jobs', 'from-the-future')).toEqual({ id: 'from-the-future', shape: 'unknown to us' });
    check.close();
  });
});
