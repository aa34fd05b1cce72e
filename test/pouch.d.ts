/** The in-memory adapter ships no types; it is only handed to PouchDB.plugin. */
declare module 'pouchdb-adapter-memory' {
  const plugin: unknown;
  export default plugin;
}
