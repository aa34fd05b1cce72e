/** pouchdb-browser ships no types; the log uses it through `jobs/pouch.ts` `LogDatabase`. */
declare module 'pouchdb-browser' {
  const PouchDB: new (name: string, options?: Record<string, unknown>) => unknown;
  export default PouchDB;
}
