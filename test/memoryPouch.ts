/**
 * The log's database in Node: pouchdb-browser's own code with the in-memory adapter in place of
 * IndexedDB (fake-indexeddb cannot hold PouchDB's blob check). Databases of one name share their
 * data within the process, as two tabs share one IndexedDB database.
 */
import './selfShim';
import PouchDB from 'pouchdb-browser';
import memoryAdapter from 'pouchdb-adapter-memory';
import type { LogDatabase, PouchFactory } from '../src/jobs/pouch';

const Pouch = PouchDB as unknown as {
  new (name: string, options: { adapter: string }): LogDatabase;
  plugin(plugin: unknown): void;
};
Pouch.plugin(memoryAdapter);

export const memoryPouch: PouchFactory = (name) => new Pouch(name, { adapter: 'memory' });

/**
 * The database seen through the log's own interface, with its write calls replaced (a fault
 * injected at that boundary). A plain delegate: PouchDB's methods call each other internally,
 * so patching them on the instance would change more than the calls the log makes.
 */
export function withWrites(
  db: LogDatabase,
  writes: { put?: LogDatabase['put']; bulkDocs?: LogDatabase['bulkDocs'] },
): LogDatabase {
  return {
    name: db.name,
    get: (id, options) => db.get(id, options),
    put: writes.put ?? ((doc) => db.put(doc)),
    bulkDocs: writes.bulkDocs ?? ((docs, options) => db.bulkDocs(docs, options)),
    allDocs: (options) => db.allDocs(options),
    changes: ((options: Parameters<LogDatabase['changes']>[0]) => db.changes(options)) as LogDatabase['changes'],
    info: () => db.info(),
    sync: (remote, options) => db.sync(remote, options),
    close: () => db.close(),
    destroy: () => db.destroy(),
  };
}
