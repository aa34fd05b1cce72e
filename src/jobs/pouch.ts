/**
 * The few PouchDB calls the log makes, typed here instead of through the library's loose
 * typings. The constructor is passed in (`PouchFactory`): the browser uses pouchdb-browser
 * (IndexedDB), the Node tests and the benchmark the in-memory adapter, so this layer never
 * imports a PouchDB build itself and the first screen never carries one.
 */

export interface StoredDoc {
  _id: string;
  _rev?: string;
  _deleted?: boolean;
  _conflicts?: string[];
  [field: string]: unknown;
}

export interface WriteResult {
  ok?: boolean;
  id?: string;
  rev?: string;
  error?: string | boolean;
  status?: number;
  name?: string;
  reason?: string;
  message?: string;
}

export interface ChangeRow {
  id: string;
  seq: number | string;
  deleted?: boolean;
  doc?: StoredDoc;
}

export interface ChangesResult {
  results: ChangeRow[];
  last_seq: number | string;
}

export interface AllDocsRow {
  id: string;
  key: string;
  value: { rev: string; deleted?: boolean };
  doc?: StoredDoc | null;
  error?: string;
}

export interface ChangesOptions {
  since?: number | string;
  include_docs?: boolean;
  conflicts?: boolean;
  limit?: number;
  live?: boolean;
  style?: 'main_only' | 'all_docs';
}

/** A live feed or a replication: an event emitter that can be cancelled. */
export interface Emitter {
  on(event: string, listener: (info: unknown) => void): Emitter;
  cancel(): void;
}

export interface LogDatabase {
  readonly name: string;
  get(id: string, options?: { rev?: string; conflicts?: boolean; revs?: boolean }): Promise<StoredDoc>;
  put(doc: StoredDoc): Promise<WriteResult>;
  bulkDocs(docs: readonly StoredDoc[], options?: { new_edits?: boolean }): Promise<WriteResult[]>;
  allDocs(options?: {
    include_docs?: boolean;
    conflicts?: boolean;
    keys?: string[];
    startkey?: string;
    endkey?: string;
    limit?: number;
  }): Promise<{ rows: AllDocsRow[]; total_rows: number }>;
  changes(options: ChangesOptions & { live: true }): Emitter;
  changes(options?: ChangesOptions): Promise<ChangesResult>;
  info(): Promise<{ doc_count: number; update_seq: number | string }>;
  /** Live two-way replication with another database (the shop server's). */
  sync(
    remote: LogDatabase,
    options: { live: boolean; retry: boolean; batch_size?: number; back_off_function?: (delay: number) => number },
  ): Emitter;
  close(): Promise<void>;
  destroy(): Promise<void>;
}

export type PouchFactory = (name: string) => LogDatabase;

/** PouchDB's error objects: a status, a name and (for storage failures) the browser's reason. */
export interface PouchError {
  status?: number;
  name?: string;
  reason?: string;
  message?: string;
}

export function pouchError(error: unknown): PouchError {
  return typeof error === 'object' && error !== null ? error : { message: String(error) };
}
