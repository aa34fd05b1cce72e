/** The job log's public surface for the screens: schema, store, queries, summary, files. */
export * from './result';
export * from './shift';
export * from './inputs';
export * from './schema';
export * from './query';
export * from './summary';
export * from './merge';
export * from './store';
export * from './persist';
export * from './backup';
export * from './csv';
export * from './transfer';
export * from './calibration';
export { JOBS_STORE, LATEST_DB_VERSION } from './migrations';
export type { Alternative } from './documents';
export type { Emitter, LogDatabase, PouchFactory } from './pouch';
