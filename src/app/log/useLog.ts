/** Reading the log from a view: reads again when its query changes or the log changes (here or in another tab). */
import { useEffect, useState } from 'preact/hooks';
import type { JobEntry, JobFilter, JobList, JobsError, JobsResult, JobStore } from '../../jobs';
import { jobStore, logChanges } from './db';

export type Loaded<T> = { state: 'loading' } | { state: 'ready'; value: T } | { state: 'failed'; error: JobsError };

/** The jobs a filter selects; the previous list stays on screen while a new one is read. */
export function useJobList(filter: JobFilter): Loaded<JobList> {
  return useLogRead(filter, listJobs);
}

/** One job by id, with its revision (an edit starts from it) and the fields kept from two devices. */
export function useJobEntry(id: string): Loaded<JobEntry> {
  return useLogRead(id, getEntry);
}

const listJobs = (store: JobStore, filter: JobFilter) => store.list(filter);
const getEntry = (store: JobStore, id: string) => store.entry(id);

/**
 * The latest answer of `read` for `query`. The query is plain data and the read gets it as its
 * argument (never from a closure), so what is read is always what was asked; its JSON text decides
 * when to read again, so a filter rebuilt on every render reads once.
 */
export function useLogRead<Q, T>(query: Q, read: (store: JobStore, query: Q) => Promise<JobsResult<T>>): Loaded<T> {
  const [loaded, setLoaded] = useState<Loaded<T>>({ state: 'loading' });
  const changes = logChanges.value;
  const queryText = JSON.stringify(query);
  useEffect(() => {
    const superseded = new AbortController();
    const asked = JSON.parse(queryText) as Q;
    void (async () => {
      const store = await jobStore();
      const result = store.ok ? await read(store.value, asked) : store;
      if (superseded.signal.aborted) return;
      setLoaded(result.ok ? { state: 'ready', value: result.value } : { state: 'failed', error: result.error });
    })();
    return () => superseded.abort();
  }, [changes, queryText, read]);
  return loaded;
}
