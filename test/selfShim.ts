// pouchdb-browser reads `self` when it loads; in Node the global object stands in for it.
(globalThis as { self?: unknown }).self ??= globalThis;
